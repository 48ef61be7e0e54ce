import type { SheetStatus } from '../api/types';

/** The words for each sheet status, as printed in title blocks and lists. */
export const STATUS_LABEL: Record<SheetStatus, string> = {
  draft: 'Draft',
  'in-check': 'In check',
  approved: 'Approved',
  superseded: 'Superseded',
};

export function isSheetStatus(value: string | null | undefined): value is SheetStatus {
  return (
    value === 'draft' || value === 'in-check' || value === 'approved' || value === 'superseded'
  );
}
