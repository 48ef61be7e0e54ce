import { useState, type FormEvent } from 'react';
import { MATERIAL_CSV_COLUMNS } from '@sheaf/engine/api';
import { describeError, isApiError } from '../../api/ApiError';
import { exportMaterials, useImportMaterials } from '../../api/materials';
import { FormAlert, FormNotice } from '../../components/FormAlert';

/** Hand text to the browser as a file download. */
function download(filename: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: 'text/csv;charset=utf-8' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  document.body.append(link);
  link.click();
  link.remove();
  URL.revokeObjectURL(url);
}

/**
 * Import and export of the organization's own materials as CSV. An import with any bad row saves
 * nothing; every bad row is listed with its row number, column and problem.
 */
export function MaterialCsvPanel({ organizationId, canWrite }: { organizationId: string; canWrite: boolean }) {
  const [text, setText] = useState('');
  const [exportError, setExportError] = useState<unknown>(null);
  const importer = useImportMaterials(organizationId);
  const details = isApiError(importer.error) ? importer.error.details : [];

  async function onExport() {
    setExportError(null);
    try {
      const result = await exportMaterials(organizationId);
      download(result.filename, result.csv);
    } catch (error) {
      setExportError(error);
    }
  }

  async function onFile(file: File | undefined) {
    if (file) setText(await file.text());
  }

  function onImport(event: FormEvent) {
    event.preventDefault();
    importer.mutate(text);
  }

  return (
    <section aria-labelledby="csv-heading" className="space-y-3">
      <h2 id="csv-heading" className="text-[1rem]">
        CSV import and export
      </h2>
      <p className="max-w-prose text-[0.8125rem] text-ink-muted">
        One material per row; columns <span className="font-mono">{MATERIAL_CSV_COLUMNS.slice(0, 7).join(', ')}, …</span> (value,
        basis and source for each of Sy, Sut, Suc, c, phi, E, nu). Export first to get a file with every column. An id that exists is
        replaced; built-in ids cannot be used.
      </p>
      <div>
        <button type="button" className="btn" onClick={onExport}>
          Export our materials (CSV)
        </button>
      </div>
      {exportError ? <FormAlert title="Export failed">{describeError(exportError)}</FormAlert> : null}
      {canWrite ? (
        <form onSubmit={onImport} className="space-y-2" aria-label="Import materials from CSV">
          <div>
            <label htmlFor="csv-file" className="mb-1 block font-medium">
              CSV file
            </label>
            <input id="csv-file" type="file" accept=".csv,text/csv" onChange={(e) => void onFile(e.target.files?.[0])} />
          </div>
          <div>
            <label htmlFor="csv-text" className="mb-1 block font-medium">
              or paste the CSV text
            </label>
            <textarea id="csv-text" className="input min-h-[6rem] font-mono text-[0.75rem]" value={text} onChange={(e) => setText(e.target.value)} />
          </div>
          <button type="submit" className="btn btn-primary" disabled={importer.isPending || text.trim() === ''}>
            {importer.isPending ? 'Importing…' : 'Import'}
          </button>
        </form>
      ) : null}
      {importer.isSuccess ? (
        <FormNotice>
          Imported: {importer.data.created} added, {importer.data.updated} replaced.
        </FormNotice>
      ) : null}
      {importer.error ? (
        <FormAlert title="Nothing was imported">
          {details.length > 0 ? (
            <>
              <p>Fix these rows and import the file again; no row was saved.</p>
              <table className="ruled mt-2 text-[0.8125rem]">
                <caption className="sr-only">Rows with problems</caption>
                <thead>
                  <tr>
                    <th scope="col">Row</th>
                    <th scope="col">Column</th>
                    <th scope="col">Problem</th>
                  </tr>
                </thead>
                <tbody>
                  {details.map((d, i) => (
                    <tr key={i}>
                      <td className="font-mono">{d.row ?? '—'}</td>
                      <td className="font-mono">{d.column ?? '—'}</td>
                      <td>{d.message.replace(/^row \d+, [^:]+: /, '')}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </>
          ) : (
            <p>{describeError(importer.error)}</p>
          )}
        </FormAlert>
      ) : null}
    </section>
  );
}
