import { useState } from 'react';
import type * as Y from 'yjs';
import { downloadText } from './downloadText';
import { sheetFileFromDoc, sheetFileName } from './sheetFile';

/**
 * Export the sheet as it is now (everyone's latest edits, straight from the live document) as a
 * format v1 file named after the calc number. A sheet with a half-typed cell cannot be a valid
 * file; the reasons are listed, naming each field.
 */
export function ExportSheetButton({ doc, fileStem }: { doc: Y.Doc; fileStem: string }) {
  const [errors, setErrors] = useState<readonly string[]>([]);
  return (
    <div className="relative">
      <button
        type="button"
        className="btn"
        onClick={() => {
          const file = sheetFileFromDoc(doc);
          if (!file.ok) {
            setErrors(file.errors);
            return;
          }
          setErrors([]);
          downloadText(file.text, sheetFileName(fileStem));
        }}
      >
        Export file
      </button>
      {errors.length > 0 ? (
        <div role="alert" className="absolute right-0 z-20 mt-1 w-[26rem] max-w-[90vw] border border-fail bg-paper p-2 text-[0.8125rem] shadow-lg">
          <p className="font-medium">Not exported: the sheet is not a valid file while these fields are wrong.</p>
          <ul className="mt-1 list-disc pl-5 font-mono">
            {errors.slice(0, 8).map((error) => (
              <li key={error}>{error}</li>
            ))}
          </ul>
          <button type="button" className="btn mt-2 px-2 py-0.5" onClick={() => setErrors([])}>
            Close
          </button>
        </div>
      ) : null}
    </div>
  );
}
