/**
 * Greedy placement of point labels: each label tries a fan of directions around its point and
 * takes the spot that collides least with labels already placed, markers, circle outlines, lines
 * and the figure's edge. Labels are placed in the order given, so put the important ones first.
 */

/** A rectangle in screen units (y down). */
export interface LabelBox {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export interface LabelRequest {
  id: string;
  text: string;
  /** The point the label belongs to (screen units). */
  x: number;
  y: number;
  /** Directions to try, in order of preference; screen radians (0 right, π/2 down). */
  directions: number[];
  /**
   * Other places the label may go, tried after the first (for captions that may sit at either
   * end of an axis). A label placed there costs a little more.
   */
  alternatives?: Array<{ x: number; y: number; directions: number[] }>;
  /** Distance from the point to the label's nearest edge; default 7. */
  gap?: number;
  fontSize: number;
}

export interface PlacedLabel {
  id: string;
  text: string;
  /** Centre of the text (use `text-anchor="middle"`). */
  x: number;
  /** Baseline of the text. */
  y: number;
  box: LabelBox;
  fontSize: number;
  /** False when every candidate collided with something and the least bad one was taken. */
  clear: boolean;
}

export interface LabelObstacles {
  /** Circle outlines a label should not cross (its inside and outside are both fine). */
  rings?: Array<{ cx: number; cy: number; r: number }>;
  /** Filled discs a label must not cover (markers). */
  discs?: Array<{ cx: number; cy: number; r: number }>;
  /** Lines a label should not cross (axes, diameters); a light penalty. */
  segments?: Array<{ x1: number; y1: number; x2: number; y2: number }>;
  /** Closed outlines (envelopes): crossing one costs the same as crossing one line. */
  outlines?: Array<Array<{ x: number; y: number }>>;
  /** Boxes already taken (captions, legends). */
  boxes?: LabelBox[];
  /** The area labels must stay inside. */
  bounds?: LabelBox;
}

/** Width of a text in the mono face: about 0.6 em per character. */
export function estimateTextWidth(text: string, fontSize: number): number {
  return text.length * fontSize * 0.61;
}

/** Height of a one-line label box. */
export function labelHeight(fontSize: number): number {
  return fontSize * 1.25;
}

/**
 * Directions fanning out from `base`: base, ±30°, ±60°, ±90°, ±135°, opposite.
 */
export function fanDirections(base: number): number[] {
  const step = Math.PI / 6;
  return [
    0,
    step,
    -step,
    2 * step,
    -2 * step,
    3 * step,
    -3 * step,
    4.5 * step,
    -4.5 * step,
    Math.PI,
  ].map((offset) => base + offset);
}

const penalty = {
  label: 1000,
  disc: 600,
  bounds: 2000,
  ring: 120,
  attribution: 60,
  segment: 45,
  candidateOrder: 1,
  fartherGap: 6,
  shift: 4,
  alternativeAnchor: 30,
  /** Per screen unit beyond the requested gap. */
  drift: 2,
};

/**
 * Place every label. Always returns one placement per request, in the same order.
 */
export function placeLabels(
  requests: LabelRequest[],
  obstacles: LabelObstacles = {},
): PlacedLabel[] {
  const placed: PlacedLabel[] = [];
  const taken: LabelBox[] = [...(obstacles.boxes ?? [])];

  for (const request of requests) {
    const width = estimateTextWidth(request.text, request.fontSize);
    const height = labelHeight(request.fontSize);
    const baseGap = request.gap ?? 7;
    let chosen = {
      box: boxInDirection(request.x, request.y, width, height, request.directions[0] ?? 0, baseGap),
      score: Number.POSITIVE_INFINITY,
    };
    const anchors = [
      { x: request.x, y: request.y, directions: request.directions },
      ...(request.alternatives ?? []),
    ];
    for (const [anchorIndex, anchor] of anchors.entries()) {
      for (const [order, direction] of anchor.directions.entries()) {
        for (const [gapIndex, gap] of [baseGap, baseGap + 10].entries()) {
          // Besides the plain spot, try sliding the label sideways by one or two of its heights
          // (across the direction), which lets a label sit beside a neighbour's instead of on it.
          for (const [shiftIndex, shift] of [0, 1, -1, 2, -2].entries()) {
            const box = shiftBox(
              boxInDirection(anchor.x, anchor.y, width, height, direction, gap),
              direction,
              shift * height,
            );
            const score =
              anchorIndex * penalty.alternativeAnchor +
              order * penalty.candidateOrder +
              gapIndex * penalty.fartherGap +
              shiftIndex * penalty.shift +
              collisionScore(box, taken, obstacles, { ...request, x: anchor.x, y: anchor.y });
            if (score < chosen.score) chosen = { box, score };
          }
        }
      }
    }

    taken.push(chosen.box);
    placed.push({
      id: request.id,
      text: request.text,
      x: (chosen.box.x0 + chosen.box.x1) / 2,
      y: chosen.box.y0 + request.fontSize * 0.95,
      box: chosen.box,
      fontSize: request.fontSize,
      clear: chosen.score < penalty.segment,
    });
  }
  return placed;
}

/**
 * The label box in a direction from the point: it leaves the point by `gap` and slides fully to
 * that side once the direction leans that way by 30° or more, so diagonal labels clear the
 * marker by their corner.
 */
function boxInDirection(
  x: number,
  y: number,
  width: number,
  height: number,
  direction: number,
  gap: number,
): LabelBox {
  const ux = Math.cos(direction);
  const uy = Math.sin(direction);
  const clamp = (v: number) => Math.max(-1, Math.min(1, v));
  const cx = x + ux * gap + (width / 2) * clamp(2 * ux);
  const cy = y + uy * gap + (height / 2) * clamp(2 * uy);
  return { x0: cx - width / 2, y0: cy - height / 2, x1: cx + width / 2, y1: cy + height / 2 };
}

/** Move a box across `direction` (to its left for a positive amount, screen axes). */
function shiftBox(box: LabelBox, direction: number, amount: number): LabelBox {
  if (amount === 0) return box;
  // Slide vertically for sideways directions and horizontally for up/down ones.
  const horizontal = Math.abs(Math.cos(direction)) >= Math.abs(Math.sin(direction));
  const dx = horizontal ? 0 : amount * 2;
  const dy = horizontal ? amount : 0;
  return { x0: box.x0 + dx, y0: box.y0 + dy, x1: box.x1 + dx, y1: box.y1 + dy };
}

function collisionScore(
  box: LabelBox,
  taken: LabelBox[],
  obstacles: LabelObstacles,
  request: LabelRequest,
): number {
  let score = 0;
  // Labels keep a few units apart so two of them never read as one.
  const spaced = { x0: box.x0 - 8, y0: box.y0 - 1, x1: box.x1 + 8, y1: box.y1 + 1 };
  for (const other of taken) if (boxesOverlap(spaced, other)) score += penalty.label;
  const ownDistance = boxDistance(box, request.x, request.y);
  // A label drifts from its point only to avoid something worse.
  score += Math.max(0, ownDistance - (request.gap ?? 7)) * penalty.drift;
  const centreX = (box.x0 + box.x1) / 2;
  const centreY = (box.y0 + box.y1) / 2;
  const ownCentreDistance = Math.hypot(centreX - request.x, centreY - request.y);
  for (const disc of obstacles.discs ?? []) {
    const own = disc.cx === request.x && disc.cy === request.y;
    const distance = boxDistance(box, disc.cx, disc.cy);
    if (distance < disc.r + (own ? 1 : 2)) {
      score += penalty.disc;
    } else if (!own) {
      // A label nearer another marker than its own would be read as that marker's: nearer by
      // edge, or close by and nearer to the label's middle.
      const centreDistance = Math.hypot(centreX - disc.cx, centreY - disc.cy);
      const nearer = distance + 1 < ownDistance;
      const besideMiddle = distance < 12 && centreDistance < ownCentreDistance;
      if (nearer || besideMiddle) score += penalty.attribution;
    }
  }
  for (const ring of obstacles.rings ?? []) if (boxCrossesRing(box, ring)) score += penalty.ring;
  for (const segment of obstacles.segments ?? []) {
    if (segmentCrossesBox(segment, box)) score += penalty.segment;
  }
  for (const outline of obstacles.outlines ?? []) {
    const crosses = outline.some((p, i) => {
      const q = outline[(i + 1) % outline.length] ?? p;
      return segmentCrossesBox({ x1: p.x, y1: p.y, x2: q.x, y2: q.y }, box);
    });
    if (crosses) score += penalty.segment;
  }
  const bounds = obstacles.bounds;
  if (
    bounds &&
    (box.x0 < bounds.x0 || box.y0 < bounds.y0 || box.x1 > bounds.x1 || box.y1 > bounds.y1)
  ) {
    score += penalty.bounds;
  }
  return score;
}

export function boxesOverlap(a: LabelBox, b: LabelBox): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

/** Distance from a point to the nearest point of a box (0 inside). */
function boxDistance(box: LabelBox, x: number, y: number): number {
  const dx = Math.max(box.x0 - x, 0, x - box.x1);
  const dy = Math.max(box.y0 - y, 0, y - box.y1);
  return Math.hypot(dx, dy);
}

/** A circle outline passes through the box when the box has points both inside and outside. */
export function boxCrossesRing(
  box: LabelBox,
  ring: { cx: number; cy: number; r: number },
): boolean {
  const nearest = boxDistance(box, ring.cx, ring.cy);
  const farthest = Math.max(
    ...[
      [box.x0, box.y0],
      [box.x1, box.y0],
      [box.x0, box.y1],
      [box.x1, box.y1],
    ].map(([px = 0, py = 0]) => Math.hypot(px - ring.cx, py - ring.cy)),
  );
  return nearest < ring.r && farthest > ring.r;
}

/** Liang–Barsky clipping: does the segment pass through the box? */
export function segmentCrossesBox(
  s: { x1: number; y1: number; x2: number; y2: number },
  box: LabelBox,
): boolean {
  const dx = s.x2 - s.x1;
  const dy = s.y2 - s.y1;
  let t0 = 0;
  let t1 = 1;
  const edges: Array<[number, number]> = [
    [-dx, s.x1 - box.x0],
    [dx, box.x1 - s.x1],
    [-dy, s.y1 - box.y0],
    [dy, box.y1 - s.y1],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return false;
      continue;
    }
    const r = q / p;
    if (p < 0) t0 = Math.max(t0, r);
    else t1 = Math.min(t1, r);
    if (t0 > t1) return false;
  }
  return true;
}
