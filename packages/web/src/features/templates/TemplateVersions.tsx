import { Link } from 'react-router-dom';
import type { TemplateVersionSummary } from '@sheaf/engine/api';
import { formatDateTime } from '../../lib/formatDateTime';

/** The versions of a template, newest first; the one shown is marked. */
export function TemplateVersions({ templateId, versions, current }: { templateId: string; versions: readonly TemplateVersionSummary[]; current: number }) {
  const latest = versions[0]?.version;
  return (
    <table className="ruled text-[0.8125rem]">
      <caption className="sr-only">Versions of this template</caption>
      <thead>
        <tr>
          <th scope="col">Version</th>
          <th scope="col">Title</th>
          <th scope="col">Saved</th>
          <th scope="col">By</th>
          <th scope="col">From</th>
        </tr>
      </thead>
      <tbody>
        {versions.map((v) => (
          <tr key={v.version} aria-current={v.version === current ? 'true' : undefined} className={v.version === current ? 'font-semibold' : undefined}>
            <td className="font-mono whitespace-nowrap">
              <Link to={`/templates/${encodeURIComponent(templateId)}${v.version === latest ? '' : `?version=${v.version}`}`} className="hover:underline">
                v{v.version}
              </Link>
              {v.version === current ? <span className="ml-1 font-sans font-normal text-ink-muted">(shown)</span> : null}
              {v.version === latest ? <span className="ml-1 font-sans font-normal text-ink-muted">latest</span> : null}
            </td>
            <td>{v.title}</td>
            <td className="font-mono whitespace-nowrap text-ink-muted">{v.createdAt ? formatDateTime(v.createdAt) : 'with Sheaf'}</td>
            <td>{v.createdByName ?? '—'}</td>
            <td>
              {v.sourceSheetId ? (
                <Link to={`/sheets/${encodeURIComponent(v.sourceSheetId)}`} className="hover:underline">
                  source sheet
                </Link>
              ) : v.sourceRevisionId ? (
                'approved revision'
              ) : (
                '—'
              )}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
