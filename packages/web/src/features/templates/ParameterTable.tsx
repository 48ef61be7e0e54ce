import type { TemplateParameter } from '@sheaf/engine';
import { rangeText } from './parameterForm';

/** A template's parameters: what the form will ask, in which unit, within which range. */
export function ParameterTable({ parameters, defaults }: { parameters: readonly TemplateParameter[]; defaults: Record<string, string> }) {
  if (parameters.length === 0) return <p className="text-ink-muted">This template has no parameters: a new sheet starts as a copy.</p>;
  return (
    <table className="ruled text-[0.8125rem]">
      <caption className="sr-only">Parameters</caption>
      <thead>
        <tr>
          <th scope="col">Parameter</th>
          <th scope="col">Name</th>
          <th scope="col">Unit</th>
          <th scope="col">Allowed range</th>
          <th scope="col">Template value</th>
        </tr>
      </thead>
      <tbody>
        {parameters.map((p) => (
          <tr key={p.cellId}>
            <td>
              {p.label}
              {p.hint ? <span className="block text-[0.75rem] text-ink-muted">{p.hint}</span> : null}
            </td>
            <td className="font-mono">{p.name}</td>
            <td className="font-mono">{p.unit || 'plain number'}</td>
            <td className="font-mono">{rangeText(p) || 'any'}</td>
            <td className="font-mono">{defaults[p.name] ?? '—'}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
