import type { ReactNode, SelectHTMLAttributes } from 'react';
import { Field, controlClass } from './field';

interface SelectOption {
  value: string;
  label: string;
  disabled?: boolean;
}

type SelectFieldProps = {
  label: ReactNode;
  hint?: ReactNode;
  error?: ReactNode;
  options: SelectOption[];
  /** Shown first with an empty value, e.g. "Any phase". */
  placeholder?: string;
  className?: string;
} & Omit<SelectHTMLAttributes<HTMLSelectElement>, 'children'>;

/** A labelled native select: native keeps keyboard and touch behaviour right on every tablet. */
export function SelectField({ label, hint, error, options, placeholder, className, ...select }: SelectFieldProps) {
  return (
    <Field label={label} hint={hint} error={error} required={select.required} className={className}>
      {(ids) => (
        <select {...select} {...ids} className={`${controlClass} min-h-10`}>
          {placeholder !== undefined && <option value="">{placeholder}</option>}
          {options.map((o) => (
            <option key={o.value} value={o.value} disabled={o.disabled}>
              {o.label}
            </option>
          ))}
        </select>
      )}
    </Field>
  );
}
