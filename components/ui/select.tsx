import { forwardRef, useId, type SelectHTMLAttributes } from 'react';

export interface SelectProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  options: { value: string; label: string }[];
  error?: string;
  hideLabel?: boolean;
}

/** A native select (keyboard and screen-reader behaviour for free) with Leeway's styling. */
export const Select = forwardRef<HTMLSelectElement, SelectProps>(function Select({ label, options, error, id, hideLabel, className = '', ...rest }, ref) {
  const auto = useId();
  const selectId = id ?? auto;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={selectId} className={hideLabel ? 'sr-only' : 'text-caption font-medium uppercase tracking-wide text-ink-soft'}>
        {label}
      </label>
      <select
        ref={ref}
        id={selectId}
        aria-invalid={error ? true : undefined}
        className={`h-10 rounded-md border bg-paper-raised px-3 text-body text-ink ${error ? 'border-brick-500' : 'border-line-strong'}`}
        {...rest}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {error ? (
        <p role="alert" className="text-caption text-brick-700">
          {error}
        </p>
      ) : null}
    </div>
  );
});
