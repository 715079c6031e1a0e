import { cx } from "./cx";

const VARIANTS = {
  primary: "bg-pine-700 text-white hover:bg-pine-800 disabled:bg-pine-700/50",
  secondary: "bg-surface text-ink border border-line-strong hover:bg-sunken disabled:text-ink-muted",
  ghost: "text-ink-soft hover:bg-sunken hover:text-ink",
  danger: "bg-danger-600 text-white hover:bg-danger-700 disabled:bg-danger-600/50",
} as const;

const SIZES = { sm: "h-8 px-3 text-sm", md: "h-10 px-4 text-sm", lg: "h-12 px-5 text-base" } as const;

export type ButtonVariant = keyof typeof VARIANTS;

export function buttonClasses(variant: ButtonVariant = "primary", size: keyof typeof SIZES = "md") {
  return cx(
    "inline-flex items-center justify-center gap-2 rounded-lg font-medium transition-colors",
    "disabled:cursor-not-allowed",
    VARIANTS[variant],
    SIZES[size],
  );
}

export function Button({
  variant = "primary",
  size = "md",
  busy = false,
  className,
  children,
  ...props
}: React.ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: ButtonVariant;
  size?: keyof typeof SIZES;
  /** Shows a spinner and disables the button while an action runs. */
  busy?: boolean;
}) {
  return (
    <button
      type="button"
      {...props}
      disabled={props.disabled || busy}
      aria-busy={busy || undefined}
      className={cx(buttonClasses(variant, size), className)}
    >
      {busy && <Spinner />}
      {children}
    </button>
  );
}

export function Spinner({ className }: { className?: string }) {
  return (
    <span
      aria-hidden
      className={cx("inline-block size-4 animate-spin rounded-full border-2 border-current border-r-transparent", className)}
    />
  );
}
