import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { useProjects } from '../../../api/projects';
import { useDeleteSheet, useUpdateSheet } from '../../../api/sheets';
import { can, type Membership, type SheetDetail } from '../../../api/types';
import { FormAlert } from '../../../components/FormAlert';
import { splitServerError } from '../../../forms/serverErrors';
import { checkMaxLength, checkRequired } from '../../../forms/validators';

type Open = 'none' | 'rename' | 'move' | 'delete';

/**
 * Rename, move to another project of the organization, or delete the sheet: small forms that
 * open in place under the title block. Shown by permission (the server still decides).
 */
export function SheetActions({ sheet, membership }: { sheet: SheetDetail; membership: Membership }) {
  const [open, setOpen] = useState<Open>('none');
  const canEdit = can(membership.role, 'sheet.edit');
  const canDelete = can(membership.role, 'sheet.delete');
  if (!canEdit && !canDelete) return null;
  const toggle = (which: Open) => setOpen((current) => (current === which ? 'none' : which));

  return (
    <div className="no-print mb-4">
      <div className="flex flex-wrap gap-2" role="group" aria-label="Sheet actions">
        {canEdit ? (
          <>
            <button type="button" className="btn" aria-expanded={open === 'rename'} onClick={() => toggle('rename')}>
              Rename
            </button>
            <button type="button" className="btn" aria-expanded={open === 'move'} onClick={() => toggle('move')}>
              Move to project
            </button>
          </>
        ) : null}
        {canDelete ? (
          <button type="button" className="btn btn-danger" aria-expanded={open === 'delete'} onClick={() => toggle('delete')}>
            Delete sheet
          </button>
        ) : null}
      </div>
      {open === 'rename' ? <RenameForm sheet={sheet} onDone={() => setOpen('none')} /> : null}
      {open === 'move' ? <MoveForm sheet={sheet} membership={membership} onDone={() => setOpen('none')} /> : null}
      {open === 'delete' ? <DeleteForm sheet={sheet} onDone={() => setOpen('none')} /> : null}
    </div>
  );
}

function RenameForm({ sheet, onDone }: { sheet: SheetDetail; onDone(): void }) {
  const update = useUpdateSheet(sheet.id);
  const [title, setTitle] = useState(sheet.title);
  const [problem, setProblem] = useState<string | undefined>();
  const server = splitServerError(update.error, { title: 'Title' });
  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    const check = checkRequired(title, 'Title') ?? checkMaxLength(title, 200, 'Title');
    setProblem(check);
    if (!check) update.mutate({ title: title.trim() }, { onSuccess: onDone });
  };
  const error = problem ?? server.field.title;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Rename sheet" className="mt-3 flex flex-wrap items-end gap-2">
      {server.form ? <FormAlert title="Not renamed">{server.form}</FormAlert> : null}
      <label className="block w-full max-w-md">
        <span className="mb-1 block font-medium">New title</span>
        <input
          className="input"
          value={title}
          onChange={(event) => setTitle(event.target.value)}
          aria-invalid={error ? 'true' : undefined}
          autoFocus
        />
        {error ? <span className="mt-1 block text-[0.8125rem] text-fail">{error}</span> : null}
      </label>
      <button type="submit" className="btn btn-primary" disabled={update.isPending}>
        {update.isPending ? 'Saving…' : 'Save title'}
      </button>
      <button type="button" className="btn" onClick={onDone}>
        Cancel
      </button>
    </form>
  );
}

function MoveForm({ sheet, membership, onDone }: { sheet: SheetDetail; membership: Membership; onDone(): void }) {
  const projects = useProjects(membership.organization.id);
  const update = useUpdateSheet(sheet.id);
  const others = (projects.data ?? []).filter((project) => project.id !== sheet.projectId);
  const [target, setTarget] = useState('');
  const chosen = target || others[0]?.id || '';
  const server = splitServerError(update.error, { projectId: 'Project' });
  return (
    <form
      aria-label="Move sheet"
      className="mt-3 flex flex-wrap items-end gap-2"
      onSubmit={(event) => {
        event.preventDefault();
        if (chosen) update.mutate({ projectId: chosen }, { onSuccess: onDone });
      }}
    >
      {server.form ? <FormAlert title="Not moved">{server.form}</FormAlert> : null}
      {projects.isPending ? (
        <p className="text-ink-muted">Loading projects…</p>
      ) : others.length === 0 ? (
        <p className="text-ink-muted">There is no other project in {membership.organization.name} to move it to.</p>
      ) : (
        <>
          <label className="block">
            <span className="mb-1 block font-medium">Move to</span>
            <select className="input" value={chosen} onChange={(event) => setTarget(event.target.value)}>
              {others.map((project) => (
                <option key={project.id} value={project.id}>
                  {project.code} — {project.name}
                </option>
              ))}
            </select>
            {server.field.projectId ? <span className="mt-1 block text-[0.8125rem] text-fail">{server.field.projectId}</span> : null}
          </label>
          <button type="submit" className="btn btn-primary" disabled={update.isPending}>
            {update.isPending ? 'Moving…' : 'Move'}
          </button>
        </>
      )}
      <button type="button" className="btn" onClick={onDone}>
        Cancel
      </button>
      <p className="w-full text-[0.8125rem] text-ink-muted">The sheet keeps its calc number {sheet.calcNumber}.</p>
    </form>
  );
}

function DeleteForm({ sheet, onDone }: { sheet: SheetDetail; onDone(): void }) {
  const remove = useDeleteSheet(sheet.id);
  const navigate = useNavigate();
  return (
    <div role="alertdialog" aria-label="Delete sheet" className="mt-3 border-l-[3px] border-fail bg-[#fbefec] px-3 py-2">
      <p>
        Delete <span className="font-mono">{sheet.calcNumber}</span> “{sheet.title}” with all its cells? Anyone who has it
        open loses access. This cannot be undone; export the file first to keep a copy.
      </p>
      {remove.error ? <FormAlert title="Not deleted">{splitServerError(remove.error, {}).form}</FormAlert> : null}
      <div className="mt-2 flex gap-2">
        <button
          type="button"
          className="btn btn-danger"
          disabled={remove.isPending}
          onClick={() =>
            remove.mutate(undefined, {
              onSuccess: () => navigate(`/projects/${encodeURIComponent(sheet.projectId)}`, { replace: true }),
            })
          }
        >
          {remove.isPending ? 'Deleting…' : 'Delete for good'}
        </button>
        <button type="button" className="btn" onClick={onDone}>
          Keep it
        </button>
      </div>
    </div>
  );
}
