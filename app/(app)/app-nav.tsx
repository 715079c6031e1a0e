"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { cx } from "@/components/ui/cx";
import type { Role } from "@/lib/auth/permissions";

const LINKS = [
  { href: "/plans", label: "Plans" },
  { href: "/routes", label: "Routes" },
  { href: "/rigs", label: "Rigs" },
  { href: "/organisation", label: "Organisation" },
] as const;

export function AppNav({ role }: { role: Role }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className="mx-auto flex max-w-6xl items-center gap-1 overflow-x-auto px-2 sm:px-4">
      {LINKS.map((link) => {
        const current = pathname === link.href || pathname.startsWith(`${link.href}/`);
        return (
          <Link
            key={link.href}
            href={link.href}
            aria-current={current ? "page" : undefined}
            className={cx(
              "whitespace-nowrap border-b-2 px-3 py-2.5 text-sm font-medium no-underline",
              current ? "border-pine-700 text-ink" : "border-transparent text-ink-muted hover:text-ink",
            )}
          >
            {link.label}
          </Link>
        );
      })}
      <span className="ml-auto hidden whitespace-nowrap pr-1 text-xs text-ink-muted sm:inline" data-testid="active-role">
        Your role: {role}
      </span>
    </nav>
  );
}
