import { Brand } from "@/components/brand";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col items-center bg-paper px-4 py-10">
      <Brand className="mb-8" />
      <main className="w-full max-w-md">{children}</main>
      <p className="mt-10 max-w-md text-center text-xs text-ink-muted">
        Fadeline gives estimates. Follow your vehicle maker&apos;s ratings, local road rules and a licensed mechanic.
      </p>
    </div>
  );
}
