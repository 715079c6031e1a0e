"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useFieldArray, useForm } from "react-hook-form";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { Field, controlClasses } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";
import { formToInput, type PlanFormValues } from "@/lib/plan-form";
import type { UnitSystem } from "@/lib/units";
import { planInputSchema } from "@/lib/validation/plan";

/** Server and schema paths (SI field names) → the form's field names. */
const FIELD_OF: Record<string, keyof PlanFormValues> = { ambientC: "ambient", startTempC: "startTemp", speedCapMs: "speedCap" };

export function PlanForm({
  organisationId,
  planId,
  initial,
  routes,
  rigs,
  unitSystem,
}: {
  organisationId: string;
  planId?: string;
  initial: PlanFormValues;
  routes: { id: string; name: string }[];
  rigs: { id: string; name: string }[];
  unitSystem: UnitSystem;
}) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<PlanFormValues>({ defaultValues: initial });
  const convoy = useFieldArray({ control: form.control, name: "rigs" });
  const { errors, isSubmitting } = form.formState;
  const tUnit = unitSystem === "metric" ? "°C" : "°F";
  const vUnit = unitSystem === "metric" ? "km/h" : "mph";

  const showErrors = (issues: { path: string; message: string }[]) => {
    for (const { path, message } of issues) {
      const [head, ...rest] = path.split(".");
      const name = (FIELD_OF[head ?? ""] ?? [head, ...rest].join(".")) as never;
      form.setError(name, { type: "validate", message });
    }
  };

  const submit = form.handleSubmit(async (values) => {
    setProblem(null);
    const parsed = planInputSchema.safeParse(formToInput(values, unitSystem));
    if (!parsed.success) return showErrors(parsed.error.issues.map((i) => ({ path: i.path.join("."), message: i.message })));
    try {
      const result = await api<{ plan: { id: string } }>(planId ? `/api/plans/${planId}` : `/api/organisations/${organisationId}/plans`, {
        method: planId ? "PUT" : "POST",
        body: parsed.data,
      });
      toast.success(planId ? "Plan saved." : "Plan created.");
      router.push(`/plans/${result.plan.id}`);
      router.refresh();
    } catch (error) {
      if (error instanceof ApiError && Object.keys(error.fields).length) showErrors(Object.entries(error.fields).map(([path, m]) => ({ path, message: m[0] ?? "" })));
      else setProblem((error as Error).message);
    }
  });

  const policy = form.watch("speedPolicy");
  return (
    <form onSubmit={submit} noValidate className="grid gap-6">
      {problem && <Notice tone="danger">{problem}</Notice>}
      <Card>
        <CardHeader title="Route and trip" />
        <div className="grid gap-4 p-5 md:grid-cols-2">
          <Field label="Plan name" error={errors.name?.message}>
            {(ids) => <input {...ids} className={`${controlClasses(!!errors.name)} h-10`} {...form.register("name")} />}
          </Field>
          <Field label="Route" error={errors.routeId?.message}>
            {(ids) => (
              <select {...ids} className={`${controlClasses(!!errors.routeId)} h-10`} {...form.register("routeId")}>
                <option value="">Choose a route…</option>
                {routes.map((r) => (
                  <option key={r.id} value={r.id}>{r.name}</option>
                ))}
              </select>
            )}
          </Field>
          <Field label="Trip date (optional)" error={errors.tripDate?.message}>
            {(ids) => <input {...ids} type="date" className={`${controlClasses(!!errors.tripDate)} h-10`} {...form.register("tripDate")} />}
          </Field>
          <Field label={`Air temperature, ${tUnit}`} hint="The warmest air you expect on the descents." error={errors.ambient?.message}>
            {(ids) => <input {...ids} inputMode="decimal" className={`${controlClasses(!!errors.ambient)} h-10`} {...form.register("ambient")} />}
          </Field>
          <Field label={`Brake temperature at the start, ${tUnit} (optional)`} hint="Leave empty when the rig starts cold (at air temperature)." error={errors.startTemp?.message}>
            {(ids) => <input {...ids} inputMode="decimal" className={`${controlClasses(!!errors.startTemp)} h-10`} {...form.register("startTemp")} />}
          </Field>
        </div>
      </Card>
      <Card>
        <CardHeader title="How the convoy drives the descents" />
        <div className="grid gap-5 p-5 md:grid-cols-2">
          <fieldset className="space-y-2 text-sm">
            <legend className="mb-1 font-medium">Descent speed</legend>
            <label className="flex gap-2"><input type="radio" value="standard" {...form.register("speedPolicy")} /> Standard: 70 / 55 / 45 km/h on 4 / 7 / 10 % grades</label>
            <label className="flex gap-2"><input type="radio" value="cautious" {...form.register("speedPolicy")} /> Cautious: 10 km/h slower on each</label>
            <label className="flex gap-2"><input type="radio" value="cap" {...form.register("speedPolicy")} /> One cap for every descent</label>
            {policy === "cap" && (
              <Field label={`Descent speed cap, ${vUnit}`} error={errors.speedCap?.message}>
                {(ids) => <input {...ids} inputMode="decimal" className={`${controlClasses(!!errors.speedCap)} h-10 w-40`} {...form.register("speedCap")} />}
              </Field>
            )}
          </fieldset>
          <fieldset className="space-y-2 text-sm">
            <legend className="mb-1 font-medium">Braking style</legend>
            <label className="flex gap-2"><input type="radio" value="steady" {...form.register("drivingStyle")} /> Steady light braking</label>
            <label className="flex gap-2"><input type="radio" value="snub" {...form.register("drivingStyle")} /> Snub braking: brake firmly to about 8 km/h below the speed, release, repeat</label>
          </fieldset>
        </div>
      </Card>
      <Card>
        <CardHeader title="Convoy" description="Each rig of the trip, with the driver or participant it belongs to." />
        <div className="space-y-3 p-5">
          {typeof errors.rigs?.message === "string" && <p className="text-sm text-danger-600">{errors.rigs.message}</p>}
          {convoy.fields.map((field, i) => (
            <div key={field.id} className="flex flex-wrap items-end gap-3" data-testid="convoy-row">
              <Field label={`Rig ${i + 1}`} error={errors.rigs?.[i]?.rigId?.message} className="min-w-56 flex-1">
                {(ids) => (
                  <select {...ids} className={`${controlClasses(!!errors.rigs?.[i]?.rigId)} h-10`} {...form.register(`rigs.${i}.rigId`)}>
                    <option value="">Choose a rig…</option>
                    {rigs.map((r) => (
                      <option key={r.id} value={r.id}>{r.name}</option>
                    ))}
                  </select>
                )}
              </Field>
              <Field label="Driver or participant" error={errors.rigs?.[i]?.label?.message} className="min-w-48 flex-1">
                {(ids) => <input {...ids} className={`${controlClasses(!!errors.rigs?.[i]?.label)} h-10`} {...form.register(`rigs.${i}.label`)} />}
              </Field>
              <Button variant="ghost" onClick={() => convoy.remove(i)} disabled={convoy.fields.length === 1} aria-label={`Remove rig ${i + 1}`}>Remove</Button>
            </div>
          ))}
          <Button variant="secondary" onClick={() => convoy.append({ rigId: "", label: "" })} disabled={convoy.fields.length >= 20}>Add a rig</Button>
        </div>
      </Card>
      <Card>
        <CardHeader title="Notes" />
        <div className="p-5">
          <textarea aria-label="Notes" rows={4} maxLength={5000} className={`${controlClasses(false)} py-2`} {...form.register("notes")} />
        </div>
      </Card>
      <div><Button type="submit" busy={isSubmitting}>{planId ? "Save plan" : "Create plan"}</Button></div>
    </form>
  );
}
