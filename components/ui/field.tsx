import type { InputHTMLAttributes, SelectHTMLAttributes } from "react";

const control =
  "block w-full rounded-md border bg-white px-3 py-2 text-base text-loam-900 shadow-sm placeholder:text-loam-400 dark:bg-loam-900 dark:text-loam-50 aria-[invalid=true]:border-ember-500 border-loam-200 dark:border-loam-800";

type FieldProps = { label: string; name: string; error?: string; hint?: string };

function describedBy(name: string, error?: string, hint?: string) {
  return [error ? `${name}-error` : null, hint ? `${name}-hint` : null].filter(Boolean).join(" ") || undefined;
}

function FieldText({ name, error, hint }: { name: string; error?: string; hint?: string }) {
  return (
    <>
      {hint && (
        <p id={`${name}-hint`} className="mt-1 text-sm text-loam-600 dark:text-loam-400">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${name}-error`} role="alert" className="mt-1 text-sm font-medium text-ember-700 dark:text-ember-100">
          {error}
        </p>
      )}
    </>
  );
}

/** A labelled input with its hint and error wired up through aria-describedby. */
export function TextField({ label, name, error, hint, id, ...input }: FieldProps & InputHTMLAttributes<HTMLInputElement>) {
  const fieldId = id ?? `field-${name}`;
  return (
    <div>
      <label htmlFor={fieldId} className="mb-1 block text-sm font-medium">
        {label}
      </label>
      <input id={fieldId} name={name} aria-invalid={error ? true : undefined} aria-describedby={describedBy(name, error, hint)} className={control} {...input} />
      <FieldText name={name} error={error} hint={hint} />
    </div>
  );
}

/** A labelled select with its hint and error. */
export function SelectField({
  label,
  name,
  error,
  hint,
  id,
  options,
  ...select
}: FieldProps & SelectHTMLAttributes<HTMLSelectElement> & { options: { value: string; label: string }[] }) {
  const fieldId = id ?? `field-${name}`;
  return (
    <div>
      <label htmlFor={fieldId} className="mb-1 block text-sm font-medium">
        {label}
      </label>
      <select id={fieldId} name={name} aria-invalid={error ? true : undefined} aria-describedby={describedBy(name, error, hint)} className={control} {...select}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <FieldText name={name} error={error} hint={hint} />
    </div>
  );
}
