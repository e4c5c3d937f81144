import { Field, Select } from '@fluentui/react-components';

export interface ScopeOption {
  id: number;
  label: string;
}

export interface ScopeSelectProps {
  /** "Region" or "Campaign". */
  label: string;
  value: number | undefined;
  options: ScopeOption[];
  pending: boolean;
  problem?: string;
  className?: string;
  onChange: (id: number | undefined) => void;
}

/** The region or campaign a pack is for: required once that scope is chosen. */
export function ScopeSelect({
  label,
  value,
  options,
  pending,
  problem,
  className,
  onChange,
}: ScopeSelectProps) {
  const noun = label.toLowerCase();
  return (
    <Field label={label} required className={className} validationMessage={problem}>
      <Select
        value={value === undefined ? '' : String(value)}
        disabled={pending}
        onChange={(_event, data) =>
          onChange(/^\d+$/.test(data.value) ? Number(data.value) : undefined)
        }
      >
        <option value="">{pending ? `Loading ${noun}s…` : `Choose a ${noun}`}</option>
        {options.map((option) => (
          <option key={option.id} value={option.id}>
            {option.label}
          </option>
        ))}
      </Select>
    </Field>
  );
}
