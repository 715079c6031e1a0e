"use client";

import { useActionState, useEffect } from "react";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import type { UnitSystem } from "@/lib/units";
import { setUnitSystemAction } from "../actions";

const LABELS: Record<UnitSystem, string> = { metric: "Metric (km, m, km/h, °C, kg)", imperial: "Imperial (mi, ft, mph, °F, lb)" };

export function UnitSystemForm({ current }: { current: UnitSystem }) {
  const [state, formAction, pending] = useActionState(setUnitSystemAction, undefined);
  useEffect(() => {
    if (state?.ok) toast.success(`Figures now show in ${state.data.unitSystem} units.`);
    else if (state && !state.ok) toast.error(state.error.message);
  }, [state]);
  return (
    <form action={formAction} className="space-y-3">
      <fieldset className="space-y-2">
        <legend className="sr-only">Units</legend>
        {(Object.keys(LABELS) as UnitSystem[]).map((u) => (
          <label key={u} className="flex items-center gap-2 text-sm">
            <input type="radio" name="unitSystem" value={u} defaultChecked={u === current} className="accent-pine-700" />
            {LABELS[u]}
          </label>
        ))}
      </fieldset>
      <Button type="submit" variant="secondary" busy={pending}>Save units</Button>
    </form>
  );
}
