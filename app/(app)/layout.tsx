import { Brand } from "@/components/brand";
import { requireWorkContext } from "@/lib/server/work-context";
import { AppNav } from "./app-nav";
import { OrganisationSwitcher } from "./organisation-switcher";
import { UserMenu } from "./user-menu";

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const { user, organisations, active } = await requireWorkContext("/plans");
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="border-b border-line bg-surface">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
          <Brand href="/plans" />
          <OrganisationSwitcher organisations={organisations} activeId={active.id} />
          <div className="ml-auto">
            <UserMenu name={user.name} email={user.email} />
          </div>
        </div>
        <AppNav role={active.role} />
      </header>
      <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-8">{children}</main>
      <footer className="border-t border-line px-4 py-5 text-center text-xs text-ink-muted">
        Fadeline gives estimates only. Follow your vehicle maker&apos;s ratings, local road rules and a licensed mechanic.
      </footer>
    </div>
  );
}
