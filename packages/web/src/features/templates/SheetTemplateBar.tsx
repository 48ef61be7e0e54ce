import { Link } from 'react-router-dom';
import type { SheetDetail } from '@sheaf/engine/api';
import { can, type Role } from '../../api/types';

/**
 * The sheet page's template line: which template and version the sheet was made from, and for
 * owners and engineers the way to save the sheet as a template. Nothing when neither applies.
 */
export function SheetTemplateBar({ sheet, role }: { sheet: SheetDetail; role: Role }) {
  const origin = sheet.template ?? null;
  const canSave = can(role, 'template.write');
  if (!origin && !canSave) return null;
  return (
    <div className="no-print mb-3 flex flex-wrap items-center justify-between gap-2 text-[0.8125rem]">
      <p className="text-ink-muted">
        {origin ? (
          <>
            Made from{' '}
            <Link
              to={`/templates/${encodeURIComponent(origin.id)}?version=${origin.version}`}
              className="underline"
            >
              {origin.id.startsWith('builtin:') ? 'a built-in template' : 'a template'}
            </Link>
            , <span className="font-mono">version {origin.version}</span>
          </>
        ) : null}
      </p>
      {canSave ? (
        <Link to={`/sheets/${encodeURIComponent(sheet.id)}/save-as-template`} className="btn px-2 py-0.5 text-[0.8125rem]">
          Save as template
        </Link>
      ) : null}
    </div>
  );
}
