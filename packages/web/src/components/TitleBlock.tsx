import type { ReactNode } from 'react';
import type { SheetSummary, Signatory } from '../api/types';
import { formatDate } from '../lib/formatDateTime';
import { StatusBadge } from './StatusBadge';

export interface Signatures {
  prepared?: Signatory | null;
  checked?: Signatory | null;
  approved?: Signatory | null;
}

/**
 * The sheet's title block, as on a drawing or a hand calculation: who it is for, what it is,
 * which revision and status, and who prepared, checked and approved it. Prints as ruled boxes.
 * Signatures come from issued revisions; an unsigned box shows a dash.
 */
export function TitleBlock({
  sheet,
  organizationName,
  signatures = {},
}: {
  sheet: SheetSummary;
  organizationName: string;
  signatures?: Signatures;
}) {
  return (
    <section aria-label="Title block" className="mb-5 border border-ink text-ink">
      <div className="grid grid-cols-2 md:grid-cols-[1.2fr_1.2fr_1fr_0.6fr]">
        <Box label="Organization">{organizationName}</Box>
        <Box label="Project">{sheet.projectName}</Box>
        <Box label="Calc no." mono>
          {sheet.calcNumber}
        </Box>
        <Box label="Rev." mono>
          {sheet.revision}
        </Box>
      </div>
      <div className="grid grid-cols-1 md:grid-cols-[1fr_auto]">
        <Box label="Title">
          <h1 className="text-[1.25rem] leading-tight">{sheet.title}</h1>
        </Box>
        <Box label="Status">
          <StatusBadge status={sheet.status} />
        </Box>
      </div>
      <div className="grid grid-cols-1 sm:grid-cols-3">
        <SignatureBox label="Prepared" signatory={signatures.prepared} />
        <SignatureBox label="Checked" signatory={signatures.checked} />
        <SignatureBox label="Approved" signatory={signatures.approved} />
      </div>
    </section>
  );
}

function Box({
  label,
  mono = false,
  children,
}: {
  label: string;
  mono?: boolean;
  children: ReactNode;
}) {
  return (
    <div className="-mt-px -ml-px border-t border-l border-ink px-2.5 py-1.5">
      <div className="text-[0.6875rem] font-medium tracking-[0.06em] text-ink-muted uppercase">
        {label}
      </div>
      <div className={`min-h-[1.4em] ${mono ? 'font-mono' : ''}`}>{children}</div>
    </div>
  );
}

function SignatureBox({
  label,
  signatory,
}: {
  label: string;
  signatory: Signatory | null | undefined;
}) {
  return (
    <Box label={label}>
      {signatory ? (
        <span>
          {signatory.name}
          {signatory.at ? (
            <span className="ml-2 font-mono text-ink-muted">{formatDate(signatory.at)}</span>
          ) : null}
        </span>
      ) : (
        <span className="text-ink-faint">
          <span aria-hidden="true">—</span>
          <span className="sr-only">not signed</span>
        </span>
      )}
    </Box>
  );
}
