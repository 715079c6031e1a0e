import { useId } from "react";
import { cx } from "./cx";

const CONTROL =
  "block w-full rounded-lg border bg-surface px-3 text-sm text-ink placeholder:text-ink-muted/70 " +
  "focus:border-pine-600 focus:outline-none focus:ring-2 focus:ring-pine-200 disabled:bg-sunken";

export function controlClasses(invalid: boolean) {
  return cx(CONTROL, invalid ? "border-danger-600" : "border-line-strong");
}

/**
 * A labelled form control with its hint and error. `children` receives the ids to wire up, so the input
 * stays a plain element that react-hook-form can register.
 */
export function Field({
  label,
  hint,
  error,
  children,
  className,
}: {
  label: string;
  hint?: React.ReactNode;
  error?: string;
  className?: string;
  children: (ids: { id: string; "aria-describedby"?: string; "aria-invalid"?: boolean }) => React.ReactNode;
}) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(" ");
  return (
    <div className={cx("space-y-1.5", className)}>
      <label htmlFor={id} className="block text-sm font-medium text-ink">
        {label}
      </label>
      {children({ id, "aria-describedby": describedBy || undefined, "aria-invalid": error ? true : undefined })}
      {hint && !error && (
        <p id={`${id}-hint`} className="text-xs text-ink-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} role="alert" className="text-xs font-medium text-danger-600">
          {error}
        </p>
      )}
    </div>
  );
}
