import { Link, useParams } from 'react-router-dom';
import { useSheetHistory } from '../api/revisions';
import { useSheet } from '../api/sheets';
import { ErrorPanel } from '../components/ErrorPanel';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { HistoryList } from '../features/review/HistoryList';
import { RevisionTable } from '../features/review/RevisionTable';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

/** /sheets/:sheetId/history — a sheet's revisions, status changes and note events, with who and when. */
export function SheetHistoryPage() {
  const { sheetId = '' } = useParams();
  const sheet = useSheet(sheetId);
  const history = useSheetHistory(sheetId);
  useDocumentTitle(sheet.data ? `History of ${sheet.data.sheet.calcNumber}` : 'History');
  if (!sheet.data) return <Loading what="the sheet" />;
  return (
    <Paper className="mx-auto max-w-[60rem]">
      <PageHeader
        title={`History of ${sheet.data.sheet.calcNumber}`}
        subtitle={sheet.data.sheet.title}
        actions={
          <>
            <Link className="btn" to={`/sheets/${sheetId}`}>
              Back to the sheet
            </Link>
            <Link className="btn" to={`/sheets/${sheetId}/revisions`}>
              Revisions and changes
            </Link>
          </>
        }
      />
      {history.isError ? <ErrorPanel error={history.error} what="the history" /> : null}
      {history.data ? (
        <>
          <h2 className="mb-2 text-[1rem]">Revisions</h2>
          <RevisionTable sheetId={sheetId} revisions={history.data.revisions} />
          <h2 className="mt-6 mb-2 text-[1rem]">Events</h2>
          <HistoryList events={history.data.events} />
        </>
      ) : (
        <Loading what="the history" />
      )}
    </Paper>
  );
}
