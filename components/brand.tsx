import Link from "next/link";
import { cx } from "./ui/cx";

/** Fadeline's mark: a road falling across a slope, ending in a glowing brake. */
export function BrandMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden className={cx("size-7", className)}>
      <rect width="32" height="32" rx="8" fill="#1f5a4f" />
      <path d="M5 9 L19 9 Q23 9 21 12 L12 19 Q10 21 14 21 L24 21" stroke="#f6f4ef" strokeWidth="2.6" fill="none" strokeLinecap="round" strokeLinejoin="round" />
      <circle cx="25" cy="21" r="3.2" fill="#d4561c" />
    </svg>
  );
}

export function Brand({ href = "/", className }: { href?: string; className?: string }) {
  return (
    <Link href={href} className={cx("inline-flex items-center gap-2 font-semibold tracking-tight text-ink no-underline", className)}>
      <BrandMark />
      <span className="text-lg">Fadeline</span>
    </Link>
  );
}
