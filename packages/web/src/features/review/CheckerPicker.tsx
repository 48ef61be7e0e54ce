import type { CheckerCandidate } from '@sheaf/engine/api';
import { SelectField } from '../../components/SelectField';
import { ROLE_INFO } from '../../lib/roles';

/**
 * Choose a checker among the members whose role allows checking, leaving out whoever may not
 * check this sheet (its preparer). With nobody to choose, says so instead of offering an empty list.
 */
export function CheckerPicker({
  candidates,
  excluded,
  value,
  onChange,
  error,
}: {
  candidates: readonly CheckerCandidate[];
  excluded: readonly string[];
  value: string;
  onChange: (userId: string) => void;
  error?: string | undefined;
}) {
  const eligible = candidates.filter((c) => !excluded.includes(c.id));
  if (eligible.length === 0) {
    return (
      <p className="text-ink-muted">
        Nobody else in the organization may check sheets. An owner can give a member the checker role.
      </p>
    );
  }
  return (
    <SelectField
      label="Checker"
      name="checkerUserId"
      value={value}
      onChange={(event) => onChange(event.target.value)}
      error={error}
      hint="A member whose role allows checking; never the preparer."
    >
      <option value="">Choose a checker…</option>
      {eligible.map((c) => (
        <option key={c.id} value={c.id}>
          {c.name} ({ROLE_INFO[c.role].label.toLowerCase()})
        </option>
      ))}
    </SelectField>
  );
}
