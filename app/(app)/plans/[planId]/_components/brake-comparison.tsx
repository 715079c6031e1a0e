"use client";

import { useMemo, useState } from "react";
import { useRouter } from "next/navigation";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import { controlClasses } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { compareBrakeSetups, withBrakeSetup, type BrakeSetup, type SetupFigures } from "@/lib/advice";
import { api } from "@/lib/client/api";
import type { Descent } from "@/lib/route";
import type { FluidClass, HeatRunOptions, PadFamily, Rig } from "@/lib/thermal";
import { formatDistance, type UnitSystem } from "@/lib/units";
import { peakText } from "@/lib/advice/render-parts";
import { worstPosition } from "@/components/plan-view/heat-text";
import { useRouteModel } from "./use-route-model";
import { positionLabel } from "./words";

type Kind = "vented-disc" | "solid-disc" | "drum";

/** The worst brake's peak in words: "beyond Fadeline's range" at or past its ceiling. */
const worstPeak = (f: SetupFigures, u: UnitSystem) => {
  const p = f.peaks[worstPosition(f.peaks)];
  return p ? peakText(p.peakC, p.ceilingC, u) : "";
};
const metres = (m: number, u: UnitSystem) => (u === "metric" ? `${Math.round(m)} m` : `${Math.round(m / 0.3048)} ft`);
const minutes = (s: number) => (s < 30 ? "none" : `${Math.round(s / 60)} min`);
const stop80 = (f: SetupFigures) => f.stopping.find((s) => s.from === "80 km/h") ?? f.stopping[0]!;
const stop50mph = (f: SetupFigures) => f.stopping.find((s) => s.from === "50 mph") ?? f.stopping[0]!;

/**
 * The rig beside the same rig with other brakes (rotor mass, vented or solid, pad family, fluid class and age)
 * on the plan's route and conditions: peaks, time at or above caution, and the hot stopping distance at the
 * bottom of each descent. Runs in the browser; planners can keep the variant as a new rig.
 */
export function BrakeComparison({ planId, organisationId, rigName, rig, options, descents, unitSystem: u, canEdit }: { planId: string; organisationId: string; rigName: string; rig: Rig; options: HeatRunOptions; descents: Descent[]; unitSystem: UnitSystem; canEdit: boolean }) {
  const router = useRouter();
  const model = useRouteModel(planId, true);
  const v = rig.vehicle;
  const [frontKind, setFrontKind] = useState<Kind>(v.frontBrakes.kind);
  const [frontMass, setFrontMass] = useState(String(v.frontBrakes.massKg));
  const [rearKind, setRearKind] = useState<Kind>(v.rearBrakes.kind);
  const [rearMass, setRearMass] = useState(String(v.rearBrakes.massKg));
  const [pads, setPads] = useState<PadFamily>(v.padFamily);
  const [fluid, setFluid] = useState<FluidClass>(v.brakeFluid.fluidClass);
  const [fluidAge, setFluidAge] = useState(String(v.brakeFluid.yearsSinceChange));
  const [trailerMass, setTrailerMass] = useState(rig.trailer?.brakes ? String(rig.trailer.brakes.massKg) : "");
  const [saving, setSaving] = useState(false);

  const parsed = useMemo(() => {
    const n = (s: string, lo: number, hi: number, what: string) => {
      const x = Number(s);
      if (s.trim() === "" || !Number.isFinite(x) || x < lo || x > hi) return { error: `${what}: between ${lo} and ${hi}.` };
      return { value: x };
    };
    const fm = n(frontMass, 2, 40, "Front rotor or drum mass, kg");
    const rm = n(rearMass, 2, 40, "Rear rotor or drum mass, kg");
    const age = n(fluidAge, 0, 20, "Years since the fluid was changed");
    const tm = rig.trailer?.brakes ? n(trailerMass, 2, 40, "Trailer drum mass, kg") : { value: 0 };
    const error = [fm, rm, age, tm].find((x) => "error" in x);
    if (error && "error" in error) return { error: error.error };
    const setup: BrakeSetup = {
      front: { kind: frontKind, massKg: (fm as { value: number }).value },
      rear: { kind: rearKind, massKg: (rm as { value: number }).value },
      padFamily: pads,
      brakeFluid: { fluidClass: fluid, yearsSinceChange: (age as { value: number }).value },
      ...(rig.trailer?.brakes ? { trailer: { massKg: (tm as { value: number }).value } } : {}),
    };
    return { setup };
  }, [frontKind, frontMass, rearKind, rearMass, pads, fluid, fluidAge, trailerMass, rig.trailer]);

  const rows = useMemo(() => {
    if (!model.route || !("setup" in parsed) || !parsed.setup) return null;
    try {
      return { rows: compareBrakeSetups({ route: model.route, descents, rig, variant: parsed.setup, options }) };
    } catch (error) {
      return { error: (error as Error).message };
    }
  }, [model.route, parsed, descents, rig, options]);

  const saveVariant = async () => {
    if (!("setup" in parsed) || !parsed.setup) return;
    setSaving(true);
    try {
      const variantRig = withBrakeSetup(rig, parsed.setup);
      const { rig: saved } = await api<{ rig: { id: string; name: string } }>(`/api/organisations/${organisationId}/rigs`, {
        method: "POST",
        body: { name: `${rigName} (other brakes)`.slice(0, 120), region: "AU", rig: variantRig },
      });
      toast.success(`Saved as ${saved.name ?? "a new rig"}.`);
      router.push(`/rigs/${saved.id}`);
    } catch (error) {
      toast.error((error as Error).message);
    } finally {
      setSaving(false);
    }
  };

  const select = (id: string, label: string, value: string, set: (v: string) => void, options: [string, string][]) => (
    <div>
      <label htmlFor={id} className="mb-1 block text-xs font-medium text-ink-soft">{label}</label>
      <select id={id} className={`${controlClasses(false)} h-9 w-full`} value={value} onChange={(e) => set(e.target.value)}>
        {options.map(([val, text]) => (
          <option key={val} value={val}>{text}</option>
        ))}
      </select>
    </div>
  );
  const input = (id: string, label: string, value: string, set: (v: string) => void) => (
    <div>
      <label htmlFor={id} className="mb-1 block text-xs font-medium text-ink-soft">{label}</label>
      <input id={id} inputMode="decimal" className={`${controlClasses(false)} h-9 w-full`} value={value} onChange={(e) => set(e.target.value)} />
    </div>
  );
  const kinds: [string, string][] = [["vented-disc", "Vented disc"], ["solid-disc", "Solid disc"], ["drum", "Drum"]];

  return (
    <div className="grid gap-4" data-testid="brake-comparison">
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        {select("bc-front-kind", "Front brakes", frontKind, (x) => setFrontKind(x as Kind), kinds)}
        {input("bc-front-mass", "Front rotor or drum mass, kg (each)", frontMass, setFrontMass)}
        {select("bc-rear-kind", "Rear brakes", rearKind, (x) => setRearKind(x as Kind), kinds)}
        {input("bc-rear-mass", "Rear rotor or drum mass, kg (each)", rearMass, setRearMass)}
        {select("bc-pads", "Disc pad family", pads, (x) => setPads(x as PadFamily), [["organic", "Organic"], ["ceramic", "Ceramic"], ["semi-metallic", "Semi-metallic"]])}
        {select("bc-fluid", "Brake fluid", fluid, (x) => setFluid(x as FluidClass), [["DOT 3", "DOT 3"], ["DOT 4", "DOT 4"], ["DOT 5.1", "DOT 5.1"], ["DOT 5", "DOT 5"]])}
        {input("bc-fluid-age", "Years since the fluid was changed", fluidAge, setFluidAge)}
        {rig.trailer?.brakes && input("bc-trailer-mass", "Trailer drum mass, kg (each)", trailerMass, setTrailerMass)}
      </div>
      {"error" in parsed && parsed.error && <Notice tone="danger">{parsed.error}</Notice>}
      {model.status === "loading" && <p className="text-sm text-ink-muted" role="status">Loading the route…</p>}
      {model.status === "error" && <Notice tone="danger">{model.message}</Notice>}
      {rows && "error" in rows && <Notice tone="danger">The model refused these brakes: {rows.error}</Notice>}
      {rows && "rows" in rows && rows.rows && (
        <div className="overflow-x-auto">
          <table className="w-full min-w-[40rem] text-sm" data-testid="brake-comparison-table">
            <thead>
              <tr className="border-b border-line text-left text-xs text-ink-muted">
                <th className="px-3 py-2 font-medium">Descent</th>
                <th className="px-3 py-2 font-medium">Peaks, as fitted</th>
                <th className="px-3 py-2 font-medium">Peaks, other brakes</th>
                <th className="px-3 py-2 font-medium">Time at or above caution</th>
                <th className="px-3 py-2 font-medium">Stopping at the bottom ({u === "metric" ? "80 km/h" : "50 mph"}), estimate</th>
              </tr>
            </thead>
            <tbody>
              {rows.rows.map((r) => {
                const pick = u === "metric" ? stop80 : stop50mph;
                const worstTime = (f: SetupFigures) => Math.max(...f.timeWarmOrAboveS.map((t) => t.seconds));
                return (
                  <tr key={r.descentIndex} className="border-b border-line align-top last:border-0">
                    <td className="px-3 py-2">↓{r.descentIndex + 1} at {formatDistance(r.descent.startDistanceM, u)}</td>
                    {[r.base, r.variant].map((f, k) => (
                      <td key={k} className="px-3 py-2 tabular-nums">
                        <span className="font-semibold">{worstPeak(f, u)}</span>
                        <span className="block text-xs text-ink-muted">{f.peaks.map((p) => `${positionLabel(p.position, rig)} ${peakText(p.peakC, p.ceilingC, u)}`).join(", ")}</span>
                      </td>
                    ))}
                    <td className="px-3 py-2">{minutes(worstTime(r.base))} → {minutes(worstTime(r.variant))}</td>
                    <td className="px-3 py-2 tabular-nums">
                      cold {metres(pick(r.base).cold.brakingDistanceM, u)} · as fitted {metres(pick(r.base).hot.brakingDistanceM, u)} · other brakes {metres(pick(r.variant).hot.brakingDistanceM, u)}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
      {canEdit && (
        <div>
          <Button variant="secondary" busy={saving} disabled={!("setup" in parsed)} onClick={saveVariant}>Keep these brakes as a new rig</Button>
        </div>
      )}
    </div>
  );
}
