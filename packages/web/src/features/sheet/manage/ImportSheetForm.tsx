import { useId, useState, type ChangeEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { useCreateSheet } from '../../../api/sheets';
import type { SheetContent } from '../../../api/types';
import { FormAlert } from '../../../components/FormAlert';
import { splitServerError } from '../../../forms/serverErrors';
import { MAX_SHEET_FILE_BYTES, readSheetFile } from './sheetFile';

/**
 * Import a sheet file (format v1) into a project: the file is read and checked here with the
 * engine's format reader, and only a valid file is sent. Every problem is listed with its JSON
 * path; nothing is created until the file is right.
 */
export function ImportSheetForm({ projectId }: { projectId: string }) {
  const inputId = useId();
  const hintId = useId();
  const create = useCreateSheet(projectId);
  const navigate = useNavigate();
  const [problems, setProblems] = useState<{ file: string; errors: readonly string[] } | null>(null);

  async function onFile(event: ChangeEvent<HTMLInputElement>) {
    const input = event.currentTarget;
    const file = input.files?.[0];
    if (!file) return;
    create.reset();
    setProblems(null);
    if (file.size > MAX_SHEET_FILE_BYTES) {
      setProblems({ file: file.name, errors: [`the file is ${(file.size / 1048576).toFixed(1)} MB; a sheet file is at most 5 MB`] });
      input.value = '';
      return;
    }
    const read = readSheetFile(await file.text(), file.name);
    if (!read.ok) {
      setProblems({ file: file.name, errors: read.errors });
      input.value = '';
      return;
    }
    create.mutate(
      { title: read.title, content: read.sheet as unknown as SheetContent },
      { onSuccess: (sheet) => navigate(`/sheets/${encodeURIComponent(sheet.id)}`) },
    );
    input.value = '';
  }

  const server = create.error ? splitServerError(create.error, {}).form : null;
  return (
    <section aria-labelledby={`${inputId}-heading`}>
      <h2 id={`${inputId}-heading`} className="mb-2 text-[1rem]">
        Import a sheet file
      </h2>
      {problems ? (
        <FormAlert title={`${problems.file} was not imported`}>
          <p>Nothing was created. Correct these fields in the file and pick it again:</p>
          <ul className="mt-1 list-disc pl-5 font-mono text-[0.8125rem]" aria-label="Problems in the file">
            {problems.errors.slice(0, 50).map((error) => (
              <li key={error}>{error}</li>
            ))}
          </ul>
          {problems.errors.length > 50 ? <p>…and {problems.errors.length - 50} more.</p> : null}
        </FormAlert>
      ) : null}
      {server ? <FormAlert title="The server did not import the sheet">{server}</FormAlert> : null}
      <label htmlFor={inputId} className="mb-1 block font-medium">
        Sheet file
      </label>
      <input
        id={inputId}
        type="file"
        accept=".json,application/json"
        aria-describedby={hintId}
        disabled={create.isPending}
        onChange={(event) => void onFile(event)}
        className="block text-[0.875rem] file:mr-3 file:rounded-[3px] file:border file:border-paper-rule file:bg-paper file:px-3 file:py-1.5 file:font-medium"
      />
      <p id={hintId} className="mt-1 text-[0.8125rem] text-ink-muted">
        A <span className="font-mono">.sheet.json</span> file (sheet format version 1), e.g. one exported from a sheet. It
        becomes a new sheet in this project under the next calc number.
        {create.isPending ? ' Importing…' : ''}
      </p>
    </section>
  );
}
