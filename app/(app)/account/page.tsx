import type { Metadata } from "next";
import { PageHeader, Card, CardHeader } from "@/components/ui/card";
import { requireWorkContext } from "@/lib/server/work-context";
import { SignOutEverywhere } from "./sign-out-everywhere";
import { UnitSystemForm } from "./unit-system-form";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage() {
  const { user, organisations } = await requireWorkContext("/account");
  return (
    <>
      <PageHeader title="Your account" />
      <div className="grid gap-6 md:grid-cols-2">
        <Card>
          <CardHeader title="You" />
          <dl className="grid grid-cols-[8rem_1fr] gap-y-2 p-5 text-sm">
            <dt className="text-ink-muted">Name</dt>
            <dd>{user.name}</dd>
            <dt className="text-ink-muted">E-mail</dt>
            <dd>{user.email}</dd>
            <dt className="text-ink-muted">Organisations</dt>
            <dd>{organisations.map((o) => `${o.name} (${o.role})`).join(", ")}</dd>
          </dl>
        </Card>
        <Card>
          <CardHeader title="Units" description="Everything is stored in SI; this only changes how figures are shown to you." />
          <div className="p-5">
            <UnitSystemForm current={user.unitSystem} />
          </div>
        </Card>
        <Card>
          <CardHeader title="Sessions" description="Lost a phone or used a shared computer? End every session at once." />
          <div className="p-5">
            <SignOutEverywhere />
          </div>
        </Card>
      </div>
    </>
  );
}
