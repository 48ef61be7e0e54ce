import { SHEET_STATUSES, type SheetStatus } from '../api/types';
import { STATUS_LABEL } from '../lib/sheetStatus';
import { StatusShape } from './StatusBadge';

/** Radio chips to narrow a list to one status; arrow keys move between them as in any radio group. */
export function StatusFilter({
  value,
  onChange,
}: {
  value: SheetStatus | null;
  onChange: (status: SheetStatus | null) => void;
}) {
  const options: { value: SheetStatus | null; label: string }[] = [
    { value: null, label: 'All' },
    ...SHEET_STATUSES.map((s) => ({ value: s, label: STATUS_LABEL[s] })),
  ];
  return (
    <fieldset className="flex flex-wrap items-center gap-1.5">
      <legend className="sr-only">Status</legend>
      <span aria-hidden="true" className="mr-1 font-medium">
        Status
      </span>
      {options.map((option) => {
        const checked = option.value === value;
        return (
          <label
            key={option.label}
            className={`inline-flex cursor-pointer items-center gap-1.5 rounded-full border px-2.5 py-0.5 has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent ${
              checked
                ? 'border-ink bg-ink text-paper'
                : 'border-paper-rule bg-white text-ink hover:bg-paper-sunk'
            }`}
          >
            <input
              type="radio"
              name="status"
              className="sr-only"
              checked={checked}
              onChange={() => onChange(option.value)}
            />
            {option.value ? <StatusShape status={option.value} /> : null}
            {option.label}
          </label>
        );
      })}
    </fieldset>
  );
}
