import { useId, type InputHTMLAttributes, type ReactNode, type TextareaHTMLAttributes } from 'react';

/** Ids that tie a control to its hint and error, so screen readers read them with the label. */
interface FieldIds {
  id: string;
  'aria-describedby'?: string;
  'aria-invalid'?: true;
}

interface FieldProps {
  label: ReactNode;
  hint?: ReactNode;
  error?: ReactNode;
  required?: boolean;
  /** Renders the control with the ids it needs. */
  children: (ids: FieldIds) => ReactNode;
  className?: string;
}

export const controlClass =
  'w-full rounded-plate border border-line bg-surface px-3 py-2 text-ink placeholder:text-ink-soft/70 ' +
  'aria-[invalid=true]:border-failed disabled:bg-plate disabled:text-ink-soft';

/** Label, control, hint and inline error in one column; the error replaces nothing, it is added under the hint. */
export function Field({ label, hint, error, required, children, className = '' }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="block text-sm font-medium text-ink">
        {label}
        {required && <span className="ml-1 text-xs font-normal text-ink-soft">(required)</span>}
      </label>
      <div className="mt-1">
        {children({ id, 'aria-describedby': describedBy, 'aria-invalid': error ? true : undefined })}
      </div>
      {hint && (
        <p id={hintId} className="mt-1 text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="mt-1 text-sm text-failed">
          {error}
        </p>
      )}
    </div>
  );
}

type Common = { label: ReactNode; hint?: ReactNode; error?: ReactNode; className?: string };

/** A labelled text input (`mono` for SMILES, ratios and other figures). */
export function TextField({
  label,
  hint,
  error,
  className,
  mono,
  ...input
}: Common & { mono?: boolean } & InputHTMLAttributes<HTMLInputElement>) {
  return (
    <Field label={label} hint={hint} error={error} required={input.required} className={className}>
      {(ids) => <input {...input} {...ids} className={`${controlClass} ${mono ? 'figure' : ''}`} />}
    </Field>
  );
}

/** A labelled multi-line text box. */
export function TextAreaField({
  label,
  hint,
  error,
  className,
  mono,
  ...area
}: Common & { mono?: boolean } & TextareaHTMLAttributes<HTMLTextAreaElement>) {
  return (
    <Field label={label} hint={hint} error={error} required={area.required} className={className}>
      {(ids) => <textarea {...area} {...ids} className={`${controlClass} ${mono ? 'figure text-sm' : ''}`} />}
    </Field>
  );
}
