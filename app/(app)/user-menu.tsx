"use client";

import Link from "next/link";
import { signOut } from "next-auth/react";
import { Button } from "@/components/ui/button";

export function UserMenu({ name, email }: { name: string; email: string }) {
  return (
    <div className="flex items-center gap-3">
      <Link href="/account" className="hidden text-right text-sm leading-tight no-underline sm:block" title={email}>
        <span className="block font-medium text-ink">{name}</span>
        <span className="block text-xs text-ink-muted">{email}</span>
      </Link>
      <Button variant="secondary" size="sm" onClick={() => signOut({ callbackUrl: "/sign-in" })}>
        Sign out
      </Button>
    </div>
  );
}
