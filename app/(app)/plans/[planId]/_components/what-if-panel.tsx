"use client";

import { useState } from "react";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import { controlClasses } from "@/components/ui/field";
import { changesAnything, emptyWhatIf, normalizeWhatIf, WHAT_IF_COOLING_RANGE, WHAT_IF_FRONT_SHARE_RANGE, type WhatIfSettings } from "@/lib/analysis/what-if";
import { api, ApiError } from "@/lib/client/api";
import { ordinal } from "@/lib/advice";
import { KG_PER_LB, M_PER_MI, type UnitSystem } from "@/lib/units";
import type { Rig } from "@/lib/thermal";
import { trailerNoun } from "./words";

export interface SavedScenario {
  id: string;
  name: string;
  settings: WhatIfSettings;
  createdAt: string;
  createdByName: string | null;
}

const speedToUser = (ms: number, u: UnitSystem) => Math.round(u === "metric" ? ms * 3.6 : (ms * 3600) / M_PER_MI);
const speedFromUser = (v: number, u: UnitSystem) => (u === "metric" ? v / 3.6 : (v * M_PER_MI) / 3600);
const tempToUser = (c: number, u: UnitSystem) => Math.round(u === "metric" ? c : (c * 9) / 5 + 32);
const tempFromUser = (v: number, u: UnitSystem) => (u === "metric" ? v : ((v - 32) * 5) / 9);
const massToUser = (kg: number, u: UnitSystem) => Math.round(u === "metric" ? kg : kg / KG_PER_LB);
const massFromUser = (v: number, u: UnitSystem) => (u === "metric" ? v : v * KG_PER_LB);

const isAutomatic = (rig: Rig) => {
  const t = rig.vehicle.transmission;
  return "preset" in t ? t.preset.includes("automatic") : t.kind === "automatic";
};

/** A number input that keeps what is typed and reports a value (or null when cleared) once it parses. */
function NumberControl({ id, label, unit, errorUnit = unit, value, placeholder, min, max, onValue }: { id: string; label: string; unit: string; errorUnit?: string; value: number | null; placeholder: string; min: number; max: number; onValue: (v: number | null) => void }) {
  const [text, setText] = useState(value === null ? "" : String(value));
  const [lastValue, setLastValue] = useState(value);
  if (value !== lastValue) {
    setLastValue(value);
    setText(value === null ? "" : String(value));
  }
  const n = Number(text);
  const bad = text.trim() !== "" && (!Number.isFinite(n) || n < min || n > max);
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-xs font-medium text-ink-soft">{label}, {unit}</label>
      <input
        id={id}
        inputMode="decimal"
        className={`${controlClasses(bad)} h-9 w-full`}
        value={text}
        placeholder={placeholder}
        aria-invalid={bad}
        aria-describedby={bad ? `${id}-error` : undefined}
        onChange={(e) => {
          const t = e.target.value;
          setText(t);
          const v = Number(t);
          if (t.trim() === "") onValue(null);
          else if (Number.isFinite(v) && v >= min && v <= max) onValue(v);
        }}
      />
      {bad && <p id={`${id}-error`} className="mt-1 text-xs text-danger-700">Between {min} and {max}{errorUnit ? ` ${errorUnit}` : ""}.</p>}
    </div>
  );
}

/**
 * The what-if controls for one rig: descent speed, held gear, air temperature, trailer controller gain, load,
 * pad family, and two of the model's uncertain parameters (cooling and the front/rear heat split, docs/model.md
 * "Uncertainty bands"), and the plan's advice applied. Empty means "as in the plan". Planners and owners save a what-if
 * as a named scenario; everyone can load one.
 */
export function WhatIfPanel({
  planId,
  rig,
  gears,
  resolved,
  settings,
  onChange,
  unitSystem: u,
  canEdit,
  scenarios,
  onScenarioSaved,
  busyNote,
}: {
  planId: string;
  rig: Rig;
  gears: number;
  /** The plan's own values of the model parameters the what-if can move (shown as "now …"). */
  resolved: { coolingFactor: number; frontShare: number };
  settings: WhatIfSettings;
  onChange: (s: WhatIfSettings) => void;
  unitSystem: UnitSystem;
  canEdit: boolean;
  scenarios: SavedScenario[];
  onScenarioSaved: (s: SavedScenario) => void;
  busyNote: string | null;
}) {
  const [name, setName] = useState("");
  const [saving, setSaving] = useState(false);
  const [nameError, setNameError] = useState<string | null>(null);
  const set = (patch: Partial<WhatIfSettings>) => onChange({ ...settings, ...patch });
  const speedUnit = u === "metric" ? "km/h" : "mph";
  const tempUnit = u === "metric" ? "°C" : "°F";
  const massUnit = u === "metric" ? "kg" : "lb";
  const electric = rig.trailer && (rig.trailer.brakeType === "electric" || rig.trailer.brakeType === "electric-over-hydraulic");
  const mine = scenarios.filter((s) => s.settings.planRigId === settings.planRigId);

  const save = async () => {
    setNameError(null);
    if (!name.trim()) return setNameError("Name the scenario.");
    setSaving(true);
    try {
      const { scenario } = await api<{ scenario: SavedScenario }>(`/api/plans/${planId}/scenarios`, { method: "POST", body: { name: name.trim(), settings } });
      onScenarioSaved(scenario);
      setName("");
      toast.success(`Scenario “${scenario.name}” saved.`);
    } catch (error) {
      setNameError(error instanceof ApiError && error.fields.name ? error.fields.name[0]! : (error as Error).message);
    } finally {
      setSaving(false);
    }
  };

  return (
    <div className="grid gap-4" data-testid="what-if">
      <label className="flex items-center gap-2 text-sm font-medium">
        <input type="checkbox" className="h-4 w-4 accent-pine-700" checked={settings.applyAdvice} onChange={(e) => set({ applyAdvice: e.target.checked })} />
        Apply the advice for this rig (gears, speeds and cool-down stops)
      </label>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <NumberControl id="wi-speed" label="Descent speed" unit={speedUnit} value={settings.descentSpeedMs === null ? null : speedToUser(settings.descentSpeedMs, u)} placeholder="as planned" min={u === "metric" ? 10 : 6} max={u === "metric" ? 100 : 62} onValue={(v) => set({ descentSpeedMs: v === null ? null : speedFromUser(v, u) })} />
        <div>
          <label htmlFor="wi-gear" className="mb-1 block text-xs font-medium text-ink-soft">Gear held on descents</label>
          <select id="wi-gear" className={`${controlClasses(false)} h-9 w-full`} value={settings.gear ?? ""} onChange={(e) => set({ gear: e.target.value === "" ? null : Number(e.target.value) })}>
            <option value="">As planned (gearbox chooses)</option>
            {Array.from({ length: gears }, (_, i) => (
              <option key={i} value={i + 1}>{ordinal(i + 1)}{isAutomatic(rig) ? ", manual mode" : ""}</option>
            ))}
          </select>
        </div>
        <NumberControl id="wi-ambient" label="Air temperature" unit={tempUnit} value={settings.ambientC === null ? null : tempToUser(settings.ambientC, u)} placeholder="as planned" min={u === "metric" ? -30 : -22} max={u === "metric" ? 55 : 131} onValue={(v) => set({ ambientC: v === null ? null : tempFromUser(v, u) })} />
        <div>
          <label htmlFor="wi-pads" className="mb-1 block text-xs font-medium text-ink-soft">Disc pad family</label>
          <select id="wi-pads" className={`${controlClasses(false)} h-9 w-full`} value={settings.padFamily ?? ""} onChange={(e) => set({ padFamily: e.target.value === "" ? null : (e.target.value as WhatIfSettings["padFamily"]) })}>
            <option value="">As fitted ({rig.vehicle.padFamily})</option>
            <option value="organic">Organic</option>
            <option value="ceramic">Ceramic</option>
            <option value="semi-metallic">Semi-metallic</option>
          </select>
        </div>
        <NumberControl id="wi-payload" label="Payload in the vehicle" unit={massUnit} value={settings.vehiclePayloadKg === null ? null : massToUser(settings.vehiclePayloadKg, u)} placeholder={`now ${massToUser(rig.load.vehiclePayloadKg, u)}`} min={0} max={u === "metric" ? 5000 : 11000} onValue={(v) => set({ vehiclePayloadKg: v === null ? null : massFromUser(v, u) })} />
        {rig.trailer && (
          <NumberControl id="wi-trailer-load" label={`Load in the ${trailerNoun(rig)}`} unit={massUnit} value={settings.trailerLoadKg === null ? null : massToUser(settings.trailerLoadKg, u)} placeholder={`now ${massToUser(rig.load.trailerLoadKg, u)}`} min={0} max={u === "metric" ? 5000 : 11000} onValue={(v) => set({ trailerLoadKg: v === null ? null : massFromUser(v, u) })} />
        )}
        <NumberControl id="wi-cooling" label="Brake cooling" unit="× the model's" value={settings.coolingFactor ?? null} placeholder={`now ${resolved.coolingFactor}`} min={WHAT_IF_COOLING_RANGE.min} max={WHAT_IF_COOLING_RANGE.max} onValue={(v) => set({ coolingFactor: v })} />
        <NumberControl id="wi-front-share" label="Front share of the vehicle's braking" unit="fraction" errorUnit="" value={settings.frontShare ?? null} placeholder={`now ${Math.round(resolved.frontShare * 100) / 100}`} min={WHAT_IF_FRONT_SHARE_RANGE.min} max={WHAT_IF_FRONT_SHARE_RANGE.max} onValue={(v) => set({ frontShare: v })} />
        {electric && (
          <NumberControl id="wi-gain" label="Trailer controller gain" unit="× ideal" value={settings.trailerGain} placeholder={`now ${rig.trailer!.controllerGain ?? 1}`} min={0} max={2} onValue={(v) => set({ trailerGain: v })} />
        )}
      </div>
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <Button variant="ghost" size="sm" disabled={!changesAnything(settings)} onClick={() => onChange(emptyWhatIf(settings.planRigId))}>Back to the plan</Button>
        {busyNote && <span className="text-ink-muted" role="status">{busyNote}</span>}
      </div>
      <div className="grid gap-3 border-t border-line pt-4 lg:grid-cols-2">
        {canEdit ? (
          <form
            className="flex flex-wrap items-end gap-2"
            onSubmit={(e) => {
              e.preventDefault();
              void save();
            }}
          >
            <div className="min-w-48 flex-1">
              <label htmlFor="wi-name" className="mb-1 block text-xs font-medium text-ink-soft">Save this what-if as a scenario</label>
              <input id="wi-name" className={`${controlClasses(!!nameError)} h-9 w-full`} value={name} maxLength={120} placeholder="e.g. Hot day, 2nd gear on the pass" onChange={(e) => setName(e.target.value)} aria-invalid={!!nameError} aria-describedby={nameError ? "wi-name-error" : undefined} />
              {nameError && <p id="wi-name-error" className="mt-1 text-xs text-danger-700">{nameError}</p>}
            </div>
            <Button type="submit" variant="secondary" size="sm" disabled={saving || !changesAnything(settings)}>{saving ? "Saving…" : "Save scenario"}</Button>
          </form>
        ) : (
          <p className="text-xs text-ink-muted">Viewers can try what-ifs; planners and owners save them as scenarios.</p>
        )}
        <div>
          <p className="mb-1 text-xs font-medium text-ink-soft">Saved scenarios for this rig</p>
          {mine.length === 0 ? (
            <p className="text-xs text-ink-muted">None yet.</p>
          ) : (
            <ul className="flex flex-wrap gap-2">
              {mine.map((s) => (
                <li key={s.id}>
                  <Button variant="secondary" size="sm" onClick={() => onChange(normalizeWhatIf(s.settings))} title={`Saved by ${s.createdByName ?? "a former member"} on ${new Date(s.createdAt).toLocaleDateString()}`}>
                    {s.name}
                  </Button>
                </li>
              ))}
            </ul>
          )}
        </div>
      </div>
    </div>
  );
}
