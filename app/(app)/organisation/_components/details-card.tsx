"use client";

import { useActionState, useEffect } from "react";
import { toast } from "sonner";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { Field, controlClasses } from "@/components/ui/field";
import { can, ROLE_DESCRIPTIONS, ROLE_LABELS } from "@/lib/auth/permissions";
import type { OrganisationSummary } from "@/lib/server/organisations";
import { renameOrganisationAction } from "../../actions";

export function DetailsCard({ organisation }: { organisation: OrganisationSummary }) {
  const [state, formAction, pending] = useActionState(renameOrganisationAction, undefined);
  useEffect(() => {
    if (state?.ok) toast.success(`Renamed to ${state.data.name}.`);
    else if (state && !state.ok && !state.error.fields) toast.error(state.error.message);
  }, [state]);
  const nameError = state && !state.ok ? state.error.fields?.name?.[0] : undefined;
  return (
    <Card>
      <CardHeader
        title="Details"
        description={
          <>
            Your role: <strong>{ROLE_LABELS[organisation.role]}</strong>. {ROLE_DESCRIPTIONS[organisation.role]}
          </>
        }
        actions={<Badge tone="pine">{organisation.kind === "personal" ? "Personal" : "Team"}</Badge>}
      />
      <div className="px-5 py-4">
        {can(organisation.role, "organisation.rename") ? (
          <form action={formAction} className="flex flex-wrap items-end gap-3">
            <input type="hidden" name="organisationId" value={organisation.id} />
            <Field label="Organisation name" error={nameError} className="min-w-64 flex-1">
              {(ids) => <input {...ids} name="name" defaultValue={organisation.name} maxLength={100} className={`${controlClasses(!!nameError)} h-10`} />}
            </Field>
            <Button type="submit" variant="secondary" busy={pending}>Rename</Button>
          </form>
        ) : (
          <p className="text-sm text-ink-soft">Only owners can rename the organisation.</p>
        )}
      </div>
    </Card>
  );
}
