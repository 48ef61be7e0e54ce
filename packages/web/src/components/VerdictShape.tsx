export type Verdict = 'pass' | 'low' | 'fail';

/**
 * The shape that accompanies every verdict, so it reads in greyscale print and without colour
 * vision: a filled circle with a tick (pass), a triangle (low margin), a square with a cross
 * (fail). Always shown next to the verdict's word, never instead of it.
 */
export function VerdictShape({
  verdict,
  className = '',
}: {
  verdict: Verdict;
  className?: string;
}) {
  const common = {
    width: 12,
    height: 12,
    viewBox: '0 0 12 12',
    'aria-hidden': true,
    className,
    focusable: false,
  } as const;
  switch (verdict) {
    case 'pass':
      return (
        <svg {...common}>
          <circle cx="6" cy="6" r="5.5" fill="currentColor" />
          <path d="M3.4 6.2 5.2 8 8.7 4.2" fill="none" stroke="#fff" strokeWidth="1.5" />
        </svg>
      );
    case 'low':
      return (
        <svg {...common}>
          <path d="M6 0.8 11.4 10.8H0.6Z" fill="currentColor" />
          <path d="M6 4.3v3.2M6 8.6v1" stroke="#fff" strokeWidth="1.3" />
        </svg>
      );
    case 'fail':
      return (
        <svg {...common}>
          <rect x="0.5" y="0.5" width="11" height="11" rx="1" fill="currentColor" />
          <path d="M3.5 3.5 8.5 8.5M8.5 3.5 3.5 8.5" stroke="#fff" strokeWidth="1.5" />
        </svg>
      );
  }
}

const VERDICT_WORD: Record<Verdict, string> = { pass: 'Pass', low: 'Low margin', fail: 'Fail' };
const VERDICT_COLOUR: Record<Verdict, string> = {
  pass: 'text-pass',
  low: 'text-low',
  fail: 'text-fail',
};

/** A verdict as shape and word together, e.g. for a factor of safety against its required value. */
export function VerdictLabel({ verdict }: { verdict: Verdict }) {
  return (
    <span className={`inline-flex items-center gap-1 font-medium ${VERDICT_COLOUR[verdict]}`}>
      <VerdictShape verdict={verdict} />
      {VERDICT_WORD[verdict]}
    </span>
  );
}
