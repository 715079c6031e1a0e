"use client";

import { useActionState, useEffect, useRef } from "react";
import { toast } from "sonner";
import type { OrganisationSummary } from "@/lib/server/organisations";
import { switchOrganisation } from "./actions";

/** Lists the user's organisations; choosing one switches the whole signed-in area to it. */
export function OrganisationSwitcher({ organisations, activeId }: { organisations: OrganisationSummary[]; activeId: string }) {
  const [state, formAction, pending] = useActionState(switchOrganisation, undefined);
  const form = useRef<HTMLFormElement>(null);
  useEffect(() => {
    if (state && !state.ok) toast.error(state.error.message);
  }, [state]);
  if (organisations.length < 2) {
    return <span className="truncate text-sm text-ink-soft" data-testid="active-organisation">{organisations[0]?.name}</span>;
  }
  return (
    <form ref={form} action={formAction} className="min-w-0">
      <label className="sr-only" htmlFor="organisation-switcher">Organisation</label>
      <select
        id="organisation-switcher"
        name="organisationId"
        defaultValue={activeId}
        disabled={pending}
        data-testid="active-organisation"
        onChange={() => form.current?.requestSubmit()}
        className="h-9 max-w-[16rem] truncate rounded-lg border border-line-strong bg-surface px-2 text-sm"
      >
        {organisations.map((o) => (
          <option key={o.id} value={o.id}>
            {o.name} · {o.role}
          </option>
        ))}
      </select>
    </form>
  );
}
