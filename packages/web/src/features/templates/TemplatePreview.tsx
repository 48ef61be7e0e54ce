import { useMemo } from 'react';
import { applyTemplateParameters, createEvaluator, formatResult, isUnitSystemId, type CellOk } from '@sheaf/engine';
import type { TemplateDetail } from '@sheaf/engine/api';
import { VerdictLabel } from '../../components/VerdictShape';
import { useMaterialsLookup } from '../materials/useMaterialsLookup';
import { verdictOf } from '../sheet/results/verdict';

interface PreviewRow {
  id: string;
  name: string;
  what: string;
  text: string;
  result: CellOk | null;
  error: string | null;
}

/**
 * The results a new sheet will have with the values in the form: the template evaluated in the
 * browser with the organization's materials (the same engine the sheet uses). Checks show their
 * factor against the required one, with the verdict as shape and word.
 */
export function TemplatePreview({ organizationId, template, values }: { organizationId: string; template: TemplateDetail; values: Record<string, string> }) {
  const materials = useMaterialsLookup(organizationId);
  const system = isUnitSystemId(template.content.unitSystem ?? '') ? (template.content.unitSystem as 'SI' | 'US') : 'SI';
  const rows = useMemo<PreviewRow[] | null>(() => {
    const outcome = applyTemplateParameters(template.content, template.parameters, values);
    if (!outcome.ok || !materials) return null;
    const evaluator = createEvaluator(outcome.content, { materials });
    const parameterCells = new Set(template.parameters.map((p) => p.cellId));
    const out: PreviewRow[] = [];
    for (const cell of outcome.content.cells) {
      if (typeof cell.name !== 'string' || parameterCells.has(cell.id)) continue;
      const result = evaluator.results.get(cell.id);
      if (!result) continue;
      if (!result.ok) {
        out.push({ id: cell.id, name: cell.name, what: cell.kind, text: '', result: null, error: result.error.message });
        continue;
      }
      const f = formatResult(result, system, 4);
      if (cell.kind === 'quantity') out.push({ id: cell.id, name: cell.name, what: 'value', text: f.value?.text ?? '', result, error: null });
      else if (cell.kind === 'criterion') {
        const material = typeof cell.material === 'string' ? `, ${cell.material}` : '';
        out.push({
          id: cell.id,
          name: cell.name,
          what: `${String(cell.theory)}${material}`,
          text: `n = ${f.factor?.text ?? '—'} (required ${f.required?.text ?? '1'})`,
          result,
          error: null,
        });
      } else if (cell.kind === 'principal') {
        out.push({ id: cell.id, name: cell.name, what: 'principal stresses', text: `${f.s1?.text}, ${f.s2?.text}, ${f.s3?.text}`, result, error: null });
      }
    }
    return out;
  }, [template, values, materials, system]);

  if (!rows) {
    return (
      <p className="text-[0.8125rem] text-ink-muted" aria-live="polite">
        {materials ? 'The preview appears when every parameter is valid.' : 'Loading the materials library for the preview…'}
      </p>
    );
  }
  return (
    <table className="ruled text-[0.8125rem]" aria-label="Results with these values">
      <thead>
        <tr>
          <th scope="col">Cell</th>
          <th scope="col">What</th>
          <th scope="col">Result</th>
          <th scope="col">Verdict</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => {
          const verdict = row.result ? verdictOf(row.result) : null;
          return (
            <tr key={row.id}>
              <td className="font-mono">{row.name}</td>
              <td className="text-ink-muted">{row.what}</td>
              <td className="font-mono">{row.error ? <span className="text-fail">{row.error}</span> : row.text}</td>
              <td>{verdict ? <VerdictLabel verdict={verdict} /> : null}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
