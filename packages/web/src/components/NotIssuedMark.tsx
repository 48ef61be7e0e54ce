import type { SheetSummary } from '../api/types';

/**
 * The mark a printed live sheet carries on every page: it is not an issued calculation, whatever
 * its status, because the live sheet can change at any time. Only an issued revision, printed from
 * its own page, is the calculation of record. Paper only.
 */
export function NotIssuedMark({ sheet }: { sheet: Pick<SheetSummary, 'revision'> }) {
  // `revision` is the number of the latest issued revision (0 before the first).
  const issued = sheet.revision;
  return (
    <div role="note" className="hidden border-2 border-ink px-2.5 py-1 print:block" data-not-issued="">
      <p className="text-[1rem] font-bold tracking-[0.08em] uppercase">Not issued — draft</p>
      <p className="text-[0.75rem]">
        The live sheet as it stood when printed; it can change at any time.{' '}
        {issued > 0
          ? `The calculation of record is revision ${issued}, printed from its own page.`
          : 'No revision of it has been issued.'}
      </p>
    </div>
  );
}
