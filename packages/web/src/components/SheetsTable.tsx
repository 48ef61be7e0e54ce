import { Link } from 'react-router-dom';
import type { SheetSummary } from '../api/types';
import { formatDateTime } from '../lib/formatDateTime';
import { StatusBadge } from './StatusBadge';

/** Sheets as rows of a register: calc number, title, project, revision, status, last change. */
export function SheetsTable({
  sheets,
  caption,
  showProject = true,
}: {
  sheets: SheetSummary[];
  caption: string;
  showProject?: boolean;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="ruled">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr>
            <th scope="col">Calc no.</th>
            <th scope="col">Title</th>
            {showProject ? <th scope="col">Project</th> : null}
            <th scope="col">Rev.</th>
            <th scope="col">Status</th>
            <th scope="col">Updated</th>
          </tr>
        </thead>
        <tbody>
          {sheets.map((sheet) => (
            <tr key={sheet.id}>
              <td className="font-mono whitespace-nowrap">{sheet.calcNumber}</td>
              <td className="min-w-[14rem]">
                <Link
                  to={`/sheets/${encodeURIComponent(sheet.id)}`}
                  className="font-medium text-ink underline-offset-2 hover:underline"
                >
                  {sheet.title}
                </Link>
              </td>
              {showProject ? (
                <td>
                  <Link
                    to={`/projects/${encodeURIComponent(sheet.projectId)}`}
                    className="text-ink-muted hover:underline"
                  >
                    {sheet.projectName}
                  </Link>
                </td>
              ) : null}
              <td className="font-mono">{sheet.revision}</td>
              <td>
                <StatusBadge status={sheet.status} />
              </td>
              <td className="font-mono whitespace-nowrap text-ink-muted">
                {formatDateTime(sheet.updatedAt)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
