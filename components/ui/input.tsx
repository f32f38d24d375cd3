import { forwardRef, useId, type InputHTMLAttributes } from 'react';

export interface InputProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  hint?: string;
  error?: string;
}

/** A labelled text input whose hint and error are announced with it (aria-describedby). */
export const Input = forwardRef<HTMLInputElement, InputProps>(function Input({ label, hint, error, id, className = '', ...rest }, ref) {
  const auto = useId();
  const inputId = id ?? auto;
  const hintId = hint ? `${inputId}-hint` : undefined;
  const errorId = error ? `${inputId}-error` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className="text-caption font-medium uppercase tracking-wide text-ink-soft">
        {label}
      </label>
      <input
        ref={ref}
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId].filter(Boolean).join(' ') || undefined}
        className={`h-10 rounded-md border bg-paper-raised px-3 text-body text-ink placeholder:text-ink-muted ${error ? 'border-brick-500' : 'border-line-strong'}`}
        {...rest}
      />
      {hint ? (
        <p id={hintId} className="text-caption text-ink-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={errorId} role="alert" className="text-caption text-brick-700">
          {error}
        </p>
      ) : null}
    </div>
  );
});
