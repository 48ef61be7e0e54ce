/**
 * Colours, strokes and type of the sheet figures.
 *
 * Plain hex values rather than CSS custom properties: the same SVG is also exported to the
 * calculation report, where no stylesheet applies. The paper, ink and accent values match
 * `src/styles/app.css`. Series colours come from the Okabe–Ito set, which stays distinct for
 * the common kinds of colour blindness; every series also has its own dash pattern and marker
 * shape so a greyscale print still tells them apart.
 */

import type { MarkerShape } from './markerShapes';

export const figureInk = '#1e2022';
export const figureInkMuted = '#57544c';
export const figureInkFaint = '#817c70';
export const figureGrid = '#e6dfd0';
export const figureFrame = '#c4bba8';
export const figurePaper = '#fbf8f1';
/** The one accent colour: focus and selection only. */
export const figureAccent = '#4a7cf0';

/** Okabe–Ito colours (darkened where they carry thin lines on paper). */
export const okabeIto = {
  blue: '#0072B2',
  vermillion: '#D55E00',
  bluishGreen: '#009E73',
  reddishPurple: '#CC79A7',
  orange: '#E69F00',
  skyBlue: '#56B4E9',
} as const;

export const numberFont = "'IBM Plex Mono', 'IBM Plex Sans', ui-monospace, Menlo, monospace";
export const textFont = "'IBM Plex Sans', system-ui, -apple-system, 'Segoe UI', sans-serif";

/** Size in SVG user units of numbers and labels inside the figures. */
export const labelFontSize = 11;
export const tickFontSize = 10;

/** How one data series is drawn: colour, dash pattern and marker shape together. */
export interface SeriesStyle {
  stroke: string;
  /** SVG `stroke-dasharray`; `undefined` for a solid line. */
  dash: string | undefined;
  marker: MarkerShape;
}

/**
 * Series styles in order of preference. No two share a colour, a dash pattern or a marker, so
 * any one of the three is enough to tell series apart.
 */
export const seriesStyles: readonly SeriesStyle[] = [
  { stroke: okabeIto.blue, dash: undefined, marker: 'circle' },
  { stroke: okabeIto.vermillion, dash: '7 4', marker: 'square' },
  { stroke: okabeIto.bluishGreen, dash: '2 3', marker: 'triangle' },
  { stroke: okabeIto.reddishPurple, dash: '10 3 2 3', marker: 'diamond' },
  { stroke: okabeIto.orange, dash: '14 4', marker: 'cross' },
  { stroke: okabeIto.skyBlue, dash: '4 2 1 2 1 2', marker: 'plus' },
];
