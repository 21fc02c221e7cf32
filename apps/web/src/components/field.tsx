import { useField } from 'formik';
import {
  useId,
  type InputHTMLAttributes,
  type ReactNode,
  type SelectHTMLAttributes,
  type TextareaHTMLAttributes,
} from 'react';

export const INPUT_CLASS =
  'block w-full rounded border border-line-strong bg-panel px-2.5 py-1.5 text-sm text-ink ' +
  'placeholder:text-muted aria-[invalid=true]:border-fail disabled:opacity-60';

export interface FieldShellProps {
  readonly id: string;
  readonly label: ReactNode;
  readonly hint?: ReactNode;
  readonly error?: string | undefined;
  readonly required?: boolean;
  readonly children: ReactNode;
  readonly className?: string;
}

/** Label, control, hint and error; the control gets ids for aria-describedby from `describedBy`. */
export function FieldShell({
  id,
  label,
  hint,
  error,
  required,
  children,
  className = '',
}: FieldShellProps) {
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-xs font-medium text-ink">
        {label}
        {required ? (
          <span className="text-muted" aria-hidden="true">
            {' '}
            *
          </span>
        ) : null}
      </label>
      {children}
      {hint && !error ? (
        <p id={`${id}-hint`} className="text-xs text-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="text-xs font-medium text-fail">
          {error}
        </p>
      ) : null}
    </div>
  );
}

export function describedBy(id: string, hint: unknown, error: unknown): string | undefined {
  if (error) return `${id}-error`;
  if (hint) return `${id}-hint`;
  return undefined;
}

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> {
  readonly label: ReactNode;
  readonly hint?: ReactNode;
  readonly error?: string | undefined;
  readonly id?: string;
}

export function TextField({
  label,
  hint,
  error,
  id,
  required,
  className,
  ...rest
}: TextFieldProps) {
  const auto = useId();
  const fieldId = id ?? auto;
  return (
    <FieldShell
      id={fieldId}
      label={label}
      hint={hint}
      error={error}
      required={required ?? false}
      className={className ?? ''}
    >
      <input
        id={fieldId}
        className={INPUT_CLASS}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        required={required}
        {...rest}
      />
    </FieldShell>
  );
}

interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> {
  readonly label: ReactNode;
  readonly hint?: ReactNode;
  readonly error?: string | undefined;
  readonly id?: string;
  readonly children: ReactNode;
}

export function SelectField({
  label,
  hint,
  error,
  id,
  children,
  className,
  ...rest
}: SelectFieldProps) {
  const auto = useId();
  const fieldId = id ?? auto;
  return (
    <FieldShell id={fieldId} label={label} hint={hint} error={error} className={className ?? ''}>
      <select
        id={fieldId}
        className={INPUT_CLASS}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        {...rest}
      >
        {children}
      </select>
    </FieldShell>
  );
}

interface TextAreaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'id'> {
  readonly label: ReactNode;
  readonly hint?: ReactNode;
  readonly error?: string | undefined;
  readonly id?: string;
}

export function TextAreaField({ label, hint, error, id, className, ...rest }: TextAreaFieldProps) {
  const auto = useId();
  const fieldId = id ?? auto;
  return (
    <FieldShell id={fieldId} label={label} hint={hint} error={error} className={className ?? ''}>
      <textarea
        id={fieldId}
        className={`${INPUT_CLASS} min-h-20`}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        {...rest}
      />
    </FieldShell>
  );
}

/** formik-bound text field: shows its error once touched or after a submit attempt. */
export function FormikTextField({
  name,
  ...rest
}: Omit<TextFieldProps, 'name' | 'value' | 'onChange' | 'onBlur' | 'error'> & { name: string }) {
  const [field, meta] = useField<string>(name);
  return (
    <TextField
      {...rest}
      {...field}
      value={field.value ?? ''}
      error={meta.touched && meta.error ? meta.error : undefined}
    />
  );
}

export function FormikSelectField({
  name,
  ...rest
}: Omit<SelectFieldProps, 'name' | 'value' | 'onChange' | 'onBlur' | 'error'> & { name: string }) {
  const [field, meta] = useField<string>(name);
  return (
    <SelectField {...rest} {...field} error={meta.touched && meta.error ? meta.error : undefined} />
  );
}

export function FormikTextAreaField({
  name,
  ...rest
}: Omit<TextAreaFieldProps, 'name' | 'value' | 'onChange' | 'onBlur' | 'error'> & {
  name: string;
}) {
  const [field, meta] = useField<string>(name);
  return (
    <TextAreaField
      {...rest}
      {...field}
      value={field.value ?? ''}
      error={meta.touched && meta.error ? meta.error : undefined}
    />
  );
}

export function CheckboxField({
  label,
  hint,
  id,
  ...rest
}: Omit<InputHTMLAttributes<HTMLInputElement>, 'type' | 'id'> & {
  label: ReactNode;
  hint?: ReactNode;
  id?: string;
}) {
  const auto = useId();
  const fieldId = id ?? auto;
  return (
    <div className="flex items-start gap-2">
      <input
        id={fieldId}
        type="checkbox"
        className="mt-0.5 h-4 w-4 accent-accent"
        aria-describedby={hint ? `${fieldId}-hint` : undefined}
        {...rest}
      />
      <div>
        <label htmlFor={fieldId} className="text-sm text-ink">
          {label}
        </label>
        {hint ? (
          <p id={`${fieldId}-hint`} className="text-xs text-muted">
            {hint}
          </p>
        ) : null}
      </div>
    </div>
  );
}

/** A form-level error (the server's message when it names no field). */
export function FormError({ message }: { message: string | undefined | null }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded border border-fail bg-fail-soft px-3 py-2 text-sm text-fail">
      {message}
    </p>
  );
}
