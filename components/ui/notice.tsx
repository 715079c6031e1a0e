import { cx } from "./cx";

const TONES = {
  info: "border-pine-200 bg-pine-50 text-pine-800",
  caution: "border-notice-600/30 bg-notice-50 text-ink",
  danger: "border-danger-600/30 bg-danger-50 text-danger-700",
} as const;

export function Notice({
  tone = "info",
  title,
  children,
  className,
}: {
  tone?: keyof typeof TONES;
  title?: string;
  children: React.ReactNode;
  className?: string;
}) {
  return (
    <div role={tone === "danger" ? "alert" : "note"} className={cx("rounded-lg border px-4 py-3 text-sm", TONES[tone], className)}>
      {title && <p className="mb-0.5 font-semibold">{title}</p>}
      <div>{children}</div>
    </div>
  );
}
