import type { SheetStatus } from '../api/types';
import { STATUS_LABEL } from '../lib/sheetStatus';

/**
 * A sheet's status as a shape and a word (never colour alone):
 * draft, an open circle (work not yet offered); in check, a half-filled circle (with the checker);
 * approved, a filled circle with a tick; superseded, an open circle struck through.
 */
export function StatusBadge({ status }: { status: SheetStatus }) {
  return (
    <span className={`inline-flex items-center gap-1.5 whitespace-nowrap ${STATUS_TONE[status]}`}>
      <StatusShape status={status} />
      <span>{STATUS_LABEL[status]}</span>
    </span>
  );
}

const STATUS_TONE: Record<SheetStatus, string> = {
  draft: 'text-ink-muted',
  'in-check': 'text-ink font-medium',
  approved: 'text-pass font-medium',
  superseded: 'text-ink-faint',
};

export function StatusShape({ status }: { status: SheetStatus }) {
  const common = {
    width: 12,
    height: 12,
    viewBox: '0 0 12 12',
    'aria-hidden': true,
    focusable: false,
    'data-shape': status,
  } as const;
  switch (status) {
    case 'draft':
      return (
        <svg {...common}>
          <circle cx="6" cy="6" r="4.75" fill="none" stroke="currentColor" strokeWidth="1.5" />
        </svg>
      );
    case 'in-check':
      return (
        <svg {...common}>
          <circle cx="6" cy="6" r="4.75" fill="none" stroke="currentColor" strokeWidth="1.5" />
          <path d="M6 1.25a4.75 4.75 0 0 1 0 9.5Z" fill="currentColor" />
        </svg>
      );
    case 'approved':
      return (
        <svg {...common}>
          <circle cx="6" cy="6" r="5.5" fill="currentColor" />
          <path d="M3.4 6.2 5.2 8 8.7 4.2" fill="none" stroke="#fff" strokeWidth="1.5" />
        </svg>
      );
    case 'superseded':
      return (
        <svg {...common}>
          <circle cx="6" cy="6" r="4.75" fill="none" stroke="currentColor" strokeWidth="1.5" />
          <path d="M2.2 9.8 9.8 2.2" stroke="currentColor" strokeWidth="1.5" />
        </svg>
      );
  }
}
