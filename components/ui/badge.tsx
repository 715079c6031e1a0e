import { cx } from "./cx";

const TONES = {
  neutral: "bg-sunken text-ink-soft",
  pine: "bg-pine-100 text-pine-800",
  notice: "bg-notice-50 text-notice-600",
  danger: "bg-danger-50 text-danger-700",
} as const;

export function Badge({ tone = "neutral", children }: { tone?: keyof typeof TONES; children: React.ReactNode }) {
  return (
    <span className={cx("inline-flex items-center rounded-full px-2 py-0.5 text-xs font-medium", TONES[tone])}>
      {children}
    </span>
  );
}
