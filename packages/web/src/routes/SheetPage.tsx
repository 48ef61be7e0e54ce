import { useRef } from 'react';
import { useParams } from 'react-router-dom';
import { useMe } from '../api/auth';
import { useSheet } from '../api/sheets';
import { Loading } from '../components/Loading';
import { NotIssuedMark } from '../components/NotIssuedMark';
import { Paper } from '../components/Paper';
import { PrintPageMargins } from '../components/PrintPageMargins';
import { PrintPages } from '../components/PrintPages';
import { TitleBlock } from '../components/TitleBlock';
import { OpenNotesProvider } from '../features/review/OpenNotesContext';
import { ReviewHeaderActions } from '../features/review/ReviewHeaderActions';
import { SheetNotesColumn } from '../features/review/SheetNotesColumn';
import { useTitleBlockSignatures } from '../features/review/useTitleBlockSignatures';
import { LiveSheet } from '../features/sheet/LiveSheet';
import { usePrintEquationFit } from '../features/sheet/hooks/usePrintEquationFit';
import { SheetActions } from '../features/sheet/manage/SheetActions';
import { SheetTemplateBar } from '../features/templates/SheetTemplateBar';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { useProjectOrganization } from '../hooks/useProjectOrganization';
import { formatDateTime } from '../lib/formatDateTime';

/**
 * /sheets/:sheetId — one calculation sheet: its title block, the actions on the sheet as a
 * whole (rename, move, delete), then its cells, live and co-edited.
 * The title block shows the signatures of the current revision; the check actions sit under it
 * and the notes rail beside the cells (features/review).
 * Printed, it carries "Not issued — draft" and the title block on every page, without the
 * controls and the notes rail: an issued calculation is printed from its revision's page.
 * A request error (403, 404, ...) is thrown to the route's error boundary by useSheet.
 */
export function SheetPage() {
  const { sheetId = '' } = useParams();
  const query = useSheet(sheetId);
  const me = useMe();
  const owner = useProjectOrganization(query.data?.sheet.projectId);
  const signatures = useTitleBlockSignatures(sheetId);
  const cellsRef = useRef<HTMLDivElement>(null);
  usePrintEquationFit();
  useDocumentTitle(
    query.data ? `${query.data.sheet.calcNumber} ${query.data.sheet.title}` : 'Sheet',
  );

  if (!query.data) return <Loading what="the sheet" />;
  const { sheet, role } = query.data;
  const organizationName = owner === undefined ? '…' : (owner?.organization.name ?? '—');

  return (
    <Paper className="mx-auto max-w-[80rem]">
      <PrintPageMargins
        topCenter="Not issued — draft"
        bottomLeft={`${sheet.calcNumber} · live sheet, not issued · printed ${formatDateTime(new Date().toISOString())}`}
        bottomRight="Page {page} of {pages}"
      />
      <PrintPages
        head={
          <div className="space-y-2">
            <NotIssuedMark sheet={sheet} />
            <TitleBlock sheet={sheet} organizationName={organizationName} signatures={signatures} />
          </div>
        }
      >
        <ReviewHeaderActions sheet={sheet} role={role} />
        <SheetTemplateBar sheet={sheet} role={role} />
        {owner ? <SheetActions sheet={sheet} membership={{ ...owner, role }} /> : null}
        <OpenNotesProvider sheetId={sheet.id}>
          <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_19rem]">
            <div ref={cellsRef} className="min-w-0">
              {/* A sheet in check is read-only for everyone; a change of status reloads the live copy. */}
              <LiveSheet
                key={`${sheet.id}:${sheet.status}`}
                sheet={sheet}
                role={sheet.status === 'in-check' ? 'viewer' : role}
                selfName={me.data?.user.name ?? 'You'}
              />
            </div>
            <div className="no-print min-w-0">
              <SheetNotesColumn sheet={sheet} cellsRef={cellsRef} />
            </div>
          </div>
        </OpenNotesProvider>
      </PrintPages>
    </Paper>
  );
}
