"use client";

import { useRouter } from "next/navigation";
import { useState, type BaseSyntheticEvent } from "react";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { Field, controlClasses } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";
import { REGION_LABELS } from "@/lib/rig-form/regions";
import { fieldKey, formToRig, rigToForm, type RigFormValues } from "@/lib/rig-form/convert";
import { LOAD_NUMBERS, TRAILER_CHOICES, TRAILER_NUMBERS, VEHICLE_CHOICES, VEHICLE_NUMBERS } from "@/lib/rig-form/fields";
import type { Rig } from "@/lib/thermal";
import type { UnitSystem } from "@/lib/units";
import { savedRigInputSchema } from "@/lib/validation/rig";
import { ChoiceFields, NumberFields } from "./rig-fields";

const grid = "grid gap-4 p-5 sm:grid-cols-2 lg:grid-cols-3";

/** Maps a schema or server path ("rig.vehicle.gvmKg", "name") to the form field that shows it. */
function formPath(path: string): string {
  const p = path.replace(/^rig\./, "");
  if (p === "name" || p === "region") return p;
  if (p === "vehicle.name") return "vehicleName";
  if (p === "trailer.name") return "trailerName";
  if (p.startsWith("vehicle.transmission")) return p.includes("gearRatios") ? "gearRatios" : p.includes("finalDrive") ? "finalDrive" : "transmission";
  return `values.${fieldKey(p.replace(/\.\d+$/, ""))}`;
}

export function RigForm({
  organisationId,
  rigId,
  initial,
  presets,
  unitSystem,
}: {
  organisationId: string;
  rigId?: string;
  initial: RigFormValues;
  presets?: { id: string; label: string; rig: Rig }[];
  unitSystem: UnitSystem;
}) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<RigFormValues>({ defaultValues: initial });
  const { register, formState, watch, reset, setError } = form;
  const { errors, isSubmitting } = formState;
  const hasTrailer = watch("hasTrailer");
  const transmission = watch("transmission");
  const customKind = watch("customKind");

  const showIssues = (issues: { path: string; message: string }[]) => {
    for (const { path, message } of issues) setError(formPath(path) as never, { type: "validate", message });
    if (issues.length) setProblem(`${issues.length === 1 ? "One field needs" : `${issues.length} fields need`} attention: the first is “${issues[0]!.message}”`);
  };

  // Errors set by hand (schema or server) would block handleSubmit forever: clear them first, then re-check.
  const submit = (event?: BaseSyntheticEvent) => {
    form.clearErrors();
    return onValid(event);
  };
  const onValid = form.handleSubmit(async (values) => {
    setProblem(null);
    const parsed = savedRigInputSchema.safeParse(formToRig(values, unitSystem));
    if (!parsed.success) return showIssues(parsed.error.issues.map((i) => ({ path: ["rig", ...i.path].join(".").replace(/^rig\.(name|region)$/, "$1"), message: i.message })));
    try {
      const result = await api<{ rig: { id: string } }>(rigId ? `/api/rigs/${rigId}` : `/api/organisations/${organisationId}/rigs`, { method: rigId ? "PUT" : "POST", body: parsed.data });
      toast.success(rigId ? "Rig saved." : "Rig added.");
      router.push(`/rigs/${result.rig.id}`);
      router.refresh();
    } catch (error) {
      if (error instanceof ApiError && Object.keys(error.fields).length) showIssues(Object.entries(error.fields).map(([path, m]) => ({ path, message: m[0] ?? "" })));
      else setProblem((error as Error).message);
    }
  });

  return (
    <form onSubmit={submit} noValidate className="grid gap-6">
      {presets && (
        <Card>
          <CardHeader title="Start from" description="Generic presets with typical values, not a particular product. Replace them with your plate and weighbridge figures." />
          <div className="flex flex-wrap gap-2 p-5">
            {presets.map((p) => (
              <Button key={p.id} variant="secondary" onClick={() => reset(rigToForm(p.rig, watch("name") || p.label, watch("region"), unitSystem))}>
                {p.label}
              </Button>
            ))}
          </div>
        </Card>
      )}
      {problem && <Notice tone="danger">{problem}</Notice>}
      <Card>
        <CardHeader title="Rig" />
        <div className={grid}>
          <Field label="Rig name" error={errors.name?.message} hint="How your group knows it, e.g. “Dana's ute and van”.">
            {(ids) => <input {...ids} className={`${controlClasses(!!errors.name)} h-10`} {...register("name")} />}
          </Field>
          <Field label="Rules of" error={errors.region?.message} hint="Trailer-brake rules differ by region.">
            {(ids) => (
              <select {...ids} className={`${controlClasses(!!errors.region)} h-10`} {...register("region")}>
                {Object.entries(REGION_LABELS).map(([code, label]) => (
                  <option key={code} value={code}>{label}</option>
                ))}
              </select>
            )}
          </Field>
        </div>
      </Card>
      <Card>
        <CardHeader title="Tow vehicle" description="Masses and ratings from the compliance plate or owner's manual; brakes from the workshop manual." />
        <div className={grid}>
          <Field label="Vehicle name" error={errors.vehicleName?.message}>
            {(ids) => <input {...ids} className={`${controlClasses(!!errors.vehicleName)} h-10`} {...register("vehicleName")} />}
          </Field>
          <ChoiceFields fields={VEHICLE_CHOICES} register={register} errors={errors} />
          <NumberFields fields={VEHICLE_NUMBERS} register={register} errors={errors} units={unitSystem} />
        </div>
        <div className="grid gap-4 border-t border-line p-5 sm:grid-cols-2 lg:grid-cols-3">
          <Field label="Transmission" error={errors.transmission?.message}>
            {(ids) => (
              <select {...ids} className={`${controlClasses(!!errors.transmission)} h-10`} {...register("transmission")}>
                <option value="generic-6-speed-automatic">Generic 6-speed automatic</option>
                <option value="generic-6-speed-manual">Generic 6-speed manual</option>
                <option value="custom">My own gear ratios</option>
              </select>
            )}
          </Field>
          {transmission === "custom" && (
            <>
              <Field label="Kind">
                {(ids) => (
                  <select {...ids} className={`${controlClasses(false)} h-10`} {...register("customKind")}>
                    <option value="automatic">Automatic</option>
                    <option value="manual">Manual</option>
                  </select>
                )}
              </Field>
              <Field label="Gear ratios, lowest gear first" hint="e.g. 4.7, 3.0, 2.1, 1.7, 1.3, 1.0" error={errors.gearRatios?.message}>
                {(ids) => <input {...ids} className={`${controlClasses(!!errors.gearRatios)} h-10`} {...register("gearRatios")} />}
              </Field>
              <Field label="Final-drive ratio" error={errors.finalDrive?.message}>
                {(ids) => <input {...ids} inputMode="decimal" className={`${controlClasses(!!errors.finalDrive)} h-10`} {...register("finalDrive")} />}
              </Field>
            </>
          )}
          {(transmission === "generic-6-speed-automatic" || (transmission === "custom" && customKind === "automatic")) && (
            <label className="flex items-center gap-2 self-end pb-2 text-sm">
              <input type="checkbox" {...register("converterLocked")} /> On descents I hold a gear in manual mode (converter locked)
            </label>
          )}
        </div>
      </Card>
      <Card>
        <CardHeader title="Trailer or caravan" actions={<label className="flex items-center gap-2 text-sm"><input type="checkbox" {...register("hasTrailer")} /> Towing</label>} />
        {hasTrailer ? (
          <div className={grid}>
            <Field label="Trailer name" error={errors.trailerName?.message}>
              {(ids) => <input {...ids} className={`${controlClasses(!!errors.trailerName)} h-10`} {...register("trailerName")} />}
            </Field>
            <ChoiceFields fields={TRAILER_CHOICES} register={register} errors={errors} />
            <NumberFields fields={TRAILER_NUMBERS} register={register} errors={errors} units={unitSystem} />
          </div>
        ) : (
          <p className="p-5 text-sm text-ink-muted">No trailer: tick “Towing” to describe one.</p>
        )}
      </Card>
      <Card>
        <CardHeader title="Load" />
        <div className={grid}>
          <NumberFields fields={LOAD_NUMBERS} register={register} errors={errors} units={unitSystem} />
          <label className="flex items-center gap-2 self-end pb-2 text-sm">
            <input type="checkbox" {...register("towBallMeasured")} /> The tow-ball mass was weighed
          </label>
        </div>
      </Card>
      <div className="flex gap-3">
        <Button type="submit" busy={isSubmitting}>{rigId ? "Save rig" : "Add rig"}</Button>
      </div>
    </form>
  );
}
