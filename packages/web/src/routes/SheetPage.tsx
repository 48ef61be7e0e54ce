import { useParams } from 'react-router-dom';
import { useSheet } from '../api/sheets';
import { Loading } from '../components/Loading';
import { Paper } from '../components/Paper';
import { RawCellList } from '../components/RawCellList';
import { TitleBlock } from '../components/TitleBlock';
import { SheetTemplateBar } from '../features/templates/SheetTemplateBar';
import { useProjectOrganization } from '../hooks/useProjectOrganization';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

/**
 * /sheets/:sheetId — one calculation sheet: its title block, then its cells.
 *
 * For now the cells are listed raw, as stored. The sheet editor (a later piece of work, to live in
 * src/features/sheet/) takes the place of <RawCellList>: it receives the same `sheet` and `role`,
 * binds each cell to the shared Yjs document and shows live results. The title block stays.
 * The prepared / checked / approved boxes stay empty until issued revisions record signatures.
 * A request error (403, 404, ...) is thrown to the route's error boundary by useSheet.
 */
export function SheetPage() {
  const { sheetId = '' } = useParams();
  const query = useSheet(sheetId);
  const owner = useProjectOrganization(query.data?.sheet.projectId);
  useDocumentTitle(
    query.data ? `${query.data.sheet.calcNumber} ${query.data.sheet.title}` : 'Sheet',
  );

  if (!query.data) return <Loading what="the sheet" />;
  const { sheet } = query.data;
  const organizationName = owner === undefined ? '…' : (owner?.organization.name ?? '—');

  return (
    <Paper className="mx-auto max-w-[60rem]">
      <TitleBlock sheet={sheet} organizationName={organizationName} />
      <SheetTemplateBar sheet={sheet} role={query.data.role} />
      <section aria-labelledby="cells-heading">
        <div className="mb-2 flex items-baseline justify-between gap-3">
          <h2 id="cells-heading" className="text-[1rem]">
            Cells <span className="font-normal text-ink-muted">({sheet.content.cells.length})</span>
          </h2>
          <p className="text-[0.8125rem] text-ink-muted">
            As stored; results are not evaluated on this page.
          </p>
        </div>
        <RawCellList cells={sheet.content.cells} />
      </section>
    </Paper>
  );
}
