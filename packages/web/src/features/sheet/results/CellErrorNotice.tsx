import type { CellError } from '@sheaf/engine';

/** The error codes in words. */
const CODE_WORDS: Record<CellError['code'], string> = {
  parse: 'Cannot read the expression',
  'unknown-name': 'Unknown name',
  cycle: 'Reference cycle',
  'unit-mismatch': 'Units do not fit',
  domain: 'Value out of range',
  upstream: 'Waits on a cell with an error',
  'invalid-field': 'Field not valid',
  'duplicate-name': 'Name used twice',
  'unknown-material': 'Unknown material',
  'not-supported': 'Not supported yet',
  evaluation: 'Evaluation failed',
  forbidden: 'Not allowed in a sheet',
};

/**
 * A cell's error value, inline where its result would be: what kind of problem (as a shape and
 * a word, not colour alone) and the engine's message, which names the field. An error that
 * started in another cell links to it.
 */
export function CellErrorNotice({
  error,
  id,
  rootLabel,
  onShowRoot,
}: {
  error: CellError;
  id: string;
  /** Name of the cell where an upstream error started, for the link. */
  rootLabel?: string;
  onShowRoot?: () => void;
}) {
  return (
    <div
      id={id}
      role="status"
      data-error-code={error.code}
      className="flex items-start gap-2 border-l-[3px] border-fail bg-[#fbefec] px-2.5 py-1.5 text-[0.875rem] print:bg-transparent"
    >
      <svg width="14" height="14" viewBox="0 0 14 14" aria-hidden="true" className="mt-[3px] shrink-0 text-fail">
        <path d="M7 1 13 12.5H1Z" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinejoin="round" />
        <path d="M7 5.2v3.6M7 10v1" stroke="currentColor" strokeWidth="1.6" />
      </svg>
      <div className="min-w-0">
        <span className="font-medium">{CODE_WORDS[error.code]}</span>
        <span className="text-ink-muted"> — </span>
        <span className="font-mono text-[0.8125rem] break-words" data-error-message>
          {error.message}
        </span>
        {error.code === 'upstream' && error.rootCellId && onShowRoot ? (
          <button type="button" className="no-print ml-2 text-[0.8125rem] underline" onClick={onShowRoot}>
            Go to {rootLabel ?? 'that cell'}
          </button>
        ) : null}
      </div>
    </div>
  );
}
