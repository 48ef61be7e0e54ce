import { useRef } from 'react';
import { useParams } from 'react-router-dom';
import { useMe } from '../api/auth';
import { useSheet } from '../api/sheets';
import { Loading } from '../components/Loading';
import { Paper } from '../components/Paper';
import { TitleBlock } from '../components/TitleBlock';
import { OpenNotesProvider } from '../features/review/OpenNotesContext';
import { ReviewHeaderActions } from '../features/review/ReviewHeaderActions';
import { SheetNotesColumn } from '../features/review/SheetNotesColumn';
import { useTitleBlockSignatures } from '../features/review/useTitleBlockSignatures';
import { LiveSheet } from '../features/sheet/LiveSheet';
import { SheetActions } from '../features/sheet/manage/SheetActions';
import { SheetTemplateBar } from '../features/templates/SheetTemplateBar';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { useProjectOrganization } from '../hooks/useProjectOrganization';

/**
 * /sheets/:sheetId — one calculation sheet: its title block, the actions on the sheet as a
 * whole (rename, move, delete), then its cells, live and co-edited.
 * The title block shows the signatures of the current revision; the check actions sit under it
 * and the notes rail beside the cells (features/review).
 * A request error (403, 404, ...) is thrown to the route's error boundary by useSheet.
 */
export function SheetPage() {
  const { sheetId = '' } = useParams();
  const query = useSheet(sheetId);
  const me = useMe();
  const owner = useProjectOrganization(query.data?.sheet.projectId);
  const signatures = useTitleBlockSignatures(sheetId);
  const cellsRef = useRef<HTMLDivElement>(null);
  useDocumentTitle(
    query.data ? `${query.data.sheet.calcNumber} ${query.data.sheet.title}` : 'Sheet',
  );

  if (!query.data) return <Loading what="the sheet" />;
  const { sheet, role } = query.data;
  const organizationName = owner === undefined ? '…' : (owner?.organization.name ?? '—');

  return (
    <Paper className="mx-auto max-w-[80rem]">
      <TitleBlock sheet={sheet} organizationName={organizationName} signatures={signatures} />
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
          <SheetNotesColumn sheet={sheet} cellsRef={cellsRef} />
        </div>
      </OpenNotesProvider>
    </Paper>
  );
}
