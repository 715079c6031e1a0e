"use client";

/**
 * "Calibrate from readings" on the rig page: infrared readings taken at a cool-down stop on one of the
 * organisation's routes fit the rig's cooling factor and engine-braking scale (docs/model.md §11). Shows the
 * stored calibration (model before and after per reading, flagged readings, the fitted factors) and the
 * route's heat run with the fit beside the uncalibrated one. Figures follow the user's unit system.
 */

import { useQuery } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import { controlClasses } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import type { AnalysisResult } from "@/lib/analysis/analyze";
import { calibrationNote, type CalibrationUse } from "@/lib/analysis/calibration-note";
import { api, ApiError } from "@/lib/client/api";
import {
  BEYOND_RANGE_TEXT,
  distanceUnit,
  formatDistance,
  formatTemperature,
  formatTemperatureDifference,
  fromDistanceUnit,
  fromTemperatureUnit,
  temperatureUnit,
  toTemperatureUnit,
  type UnitSystem,
} from "@/lib/units";
import { MAX_MINUTES_AFTER_STOP, MAX_READINGS, READING_MAX_C, READING_MIN_C, type ReadingPosition, type StoredCalibration } from "@/lib/validation/calibration";

type RouteChoice = { id: string; name: string; lengthM: number };
type Row = { key: number; position: ReadingPosition; at: string; temp: string; minutes: string };
type Errors = Record<string, string>;

const POSITION_TEXT: Record<ReadingPosition, string> = { front: "Front", rear: "Rear", trailer: "Trailer" };
const CLASS_TEXT: Record<string, string> = { cool: "cool", warm: "warm (caution)", hot: "hot (fade likely)", "boil-risk": "boil risk (brake fluid)", runaway: "runaway (brakes may fail)" };

let nextKey = 1;
const emptyRow = (position: ReadingPosition): Row => ({ key: nextKey++, position, at: "", temp: "", minutes: "" });

/** A number typed in a field ("," taken as a decimal point), or null when it is not one. */
function numberOf(text: string): number | null {
  const t = text.trim().replace(",", ".");
  if (t === "" || !/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) return null;
  return Number(t);
}

export function CalibrationSection({
  rigId,
  canEdit,
  unitSystem,
  routes,
  positions,
  initial,
}: {
  rigId: string;
  canEdit: boolean;
  unitSystem: UnitSystem;
  routes: RouteChoice[];
  positions: { position: ReadingPosition; validityCeilingC: number }[];
  initial: StoredCalibration | null;
}) {
  const [calibration, setCalibration] = useState<StoredCalibration | null>(initial);
  const ceilings = Object.fromEntries(positions.map((p) => [p.position, p.validityCeilingC])) as Partial<Record<ReadingPosition, number>>;
  const routeName = (id: string) => routes.find((r) => r.id === id)?.name ?? "a route no longer kept";
  return (
    <div className="space-y-6">
      {calibration ? (
        <>
          <CalibrationView calibration={calibration} unitSystem={unitSystem} routeName={routeName(calibration.routeId)} ceilings={ceilings} />
          {canEdit && <ClearCalibration rigId={rigId} onCleared={() => setCalibration(null)} />}
          <Reforecast rigId={rigId} calibration={calibration} unitSystem={unitSystem} routeName={routeName(calibration.routeId)} />
        </>
      ) : (
        <p className="text-sm text-ink-muted">
          Not calibrated: heat runs use the model&apos;s typical cooling and engine braking.
          {canEdit ? " Readings taken with an infrared thermometer at a cool-down stop let the model fit this rig." : " Planners and owners can calibrate it from readings."}
        </p>
      )}
      {canEdit && routes.length === 0 && <p className="text-sm text-ink-muted">Upload the route the readings were taken on first, on Routes.</p>}
      {canEdit && routes.length > 0 && (
        <ReadingsForm
          rigId={rigId}
          unitSystem={unitSystem}
          routes={routes}
          positions={positions.map((p) => p.position)}
          firstRouteId={calibration && routes.some((r) => r.id === calibration.routeId) ? calibration.routeId : routes[0]!.id}
          again={calibration !== null}
          onStored={setCalibration}
        />
      )}
    </div>
  );
}

function ReadingsForm({
  rigId,
  unitSystem,
  routes,
  positions,
  firstRouteId,
  again,
  onStored,
}: {
  rigId: string;
  unitSystem: UnitSystem;
  routes: RouteChoice[];
  positions: ReadingPosition[];
  firstRouteId: string;
  again: boolean;
  onStored: (c: StoredCalibration) => void;
}) {
  const router = useRouter();
  const formId = useId();
  const [routeId, setRouteId] = useState(firstRouteId);
  const [rows, setRows] = useState<Row[]>(() => [emptyRow(positions[0]!)]);
  const [errors, setErrors] = useState<Errors>({});
  const [general, setGeneral] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const route = routes.find((r) => r.id === routeId) ?? routes[0]!;
  const dUnit = distanceUnit(unitSystem);
  const tUnit = temperatureUnit(unitSystem);
  const minShown = Math.round(toTemperatureUnit(READING_MIN_C, unitSystem));
  const maxShown = Math.round(toTemperatureUnit(READING_MAX_C, unitSystem));

  const update = (key: number, patch: Partial<Row>) => setRows((rs) => rs.map((r) => (r.key === key ? { ...r, ...patch } : r)));

  /** Checks every field in the user's units; the typed text is kept as it is. */
  function check(): Errors {
    const e: Errors = {};
    rows.forEach((r, i) => {
      const n = `Reading ${i + 1}`;
      if (!positions.includes(r.position)) e[`${i}.position`] = `${n}: choose a brake this rig has.`;
      const at = numberOf(r.at);
      if (at === null) e[`${i}.at`] = `${n}: enter how far along the route, in ${dUnit}.`;
      else if (at < 0) e[`${i}.at`] = `${n}: the distance is 0 or more.`;
      else if (fromDistanceUnit(at, unitSystem) > route.lengthM + 0.5) e[`${i}.at`] = `${n}: the route is ${formatDistance(route.lengthM, unitSystem)} long.`;
      const temp = numberOf(r.temp);
      if (temp === null) e[`${i}.temp`] = `${n}: enter the temperature read, in ${tUnit}.`;
      else if (temp < minShown || temp > maxShown) e[`${i}.temp`] = `${n}: a reading is between ${minShown} and ${maxShown} ${tUnit}.`;
      if (r.minutes.trim() !== "") {
        const m = numberOf(r.minutes);
        if (m === null || m < 0 || m > MAX_MINUTES_AFTER_STOP) e[`${i}.minutes`] = `${n}: minutes after stopping are between 0 and ${MAX_MINUTES_AFTER_STOP}.`;
      }
    });
    return e;
  }

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    setGeneral(null);
    const e = check();
    setErrors(e);
    if (Object.keys(e).length > 0) return;
    const readings = rows.map((r) => ({
      position: r.position,
      atM: Math.min(route.lengthM, fromDistanceUnit(numberOf(r.at)!, unitSystem)),
      tempC: Math.min(READING_MAX_C, Math.max(READING_MIN_C, fromTemperatureUnit(numberOf(r.temp)!, unitSystem))),
      ...(r.minutes.trim() !== "" ? { minutesAfterStop: numberOf(r.minutes)! } : {}),
    }));
    setBusy(true);
    try {
      const { calibration } = await api<{ calibration: StoredCalibration }>(`/api/rigs/${rigId}/calibration`, { body: { routeId, readings } });
      onStored(calibration);
      toast.success("Calibration stored. Heat runs of this rig now use it.");
      router.refresh();
    } catch (error) {
      const server: Errors = {};
      if (error instanceof ApiError) {
        for (const [field, messages] of Object.entries(error.fields)) {
          const m = /^readings\.(\d+)\.(\w+)$/.exec(field);
          const name = m ? { position: "position", atM: "at", atKm: "at", tempC: "temp", minutesAfterStop: "minutes" }[m[2]!] : null;
          if (m && name) server[`${m[1]}.${name}`] = messages[0]!;
          else if (field === "routeId") server.route = messages[0]!;
          else server[field] = messages[0]!;
        }
      }
      setErrors(server);
      setGeneral((error as Error).message);
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate className="space-y-4 rounded-lg border border-line p-4" aria-labelledby={`${formId}-title`} data-testid="calibration-form">
      <div>
        <h3 id={`${formId}-title`} className="text-sm font-semibold">{again ? "Calibrate again" : "Enter readings"}</h3>
        <p className="mt-0.5 text-xs text-ink-muted">
          Read each brake soon after stopping (on the disc face or the drum), and note where on the route you stopped. Two or more readings fit both factors; one reading fits the cooling factor only. Up to {MAX_READINGS}.
        </p>
      </div>
      <label className="block max-w-md text-sm">
        <span className="mb-1 block font-medium">Route the readings were taken on</span>
        <select value={routeId} onChange={(e) => setRouteId(e.target.value)} className={`${controlClasses(Boolean(errors.route))} h-10`} aria-invalid={errors.route ? true : undefined}>
          {routes.map((r) => <option key={r.id} value={r.id}>{r.name} ({formatDistance(r.lengthM, unitSystem)})</option>)}
        </select>
        {errors.route && <span role="alert" className="mt-1 block text-xs font-medium text-danger-600">{errors.route}</span>}
      </label>
      <ol className="space-y-3">
        {rows.map((r, i) => (
          <li key={r.key} className="rounded-lg bg-sunken/60 p-3" data-testid="reading-row">
            <div className="mb-2 flex items-center justify-between gap-2">
              <span className="text-sm font-medium">Reading {i + 1}</span>
              {rows.length > 1 && (
                <Button variant="ghost" size="sm" onClick={() => setRows((rs) => rs.filter((x) => x.key !== r.key))} aria-label={`Remove reading ${i + 1}`}>Remove</Button>
              )}
            </div>
            <div className="grid grid-cols-2 gap-3 md:grid-cols-4">
              <RowField label="Brake" error={errors[`${i}.position`]}>
                {(ids) => (
                  <select {...ids} value={r.position} onChange={(e) => update(r.key, { position: e.target.value as ReadingPosition })} className={`${controlClasses(Boolean(errors[`${i}.position`]))} h-10`}>
                    {positions.map((p) => <option key={p} value={p}>{POSITION_TEXT[p]}</option>)}
                  </select>
                )}
              </RowField>
              <RowField label={`Along the route (${dUnit})`} error={errors[`${i}.at`]}>
                {(ids) => <input {...ids} inputMode="decimal" value={r.at} onChange={(e) => update(r.key, { at: e.target.value })} className={`${controlClasses(Boolean(errors[`${i}.at`]))} h-10`} />}
              </RowField>
              <RowField label={`Temperature (${tUnit})`} error={errors[`${i}.temp`]}>
                {(ids) => <input {...ids} inputMode="decimal" value={r.temp} onChange={(e) => update(r.key, { temp: e.target.value })} className={`${controlClasses(Boolean(errors[`${i}.temp`]))} h-10`} />}
              </RowField>
              <RowField label="Minutes after stopping" error={errors[`${i}.minutes`]}>
                {(ids) => <input {...ids} inputMode="decimal" placeholder="0" value={r.minutes} onChange={(e) => update(r.key, { minutes: e.target.value })} className={`${controlClasses(Boolean(errors[`${i}.minutes`]))} h-10`} />}
              </RowField>
            </div>
          </li>
        ))}
      </ol>
      {general && <Notice tone="danger">{general}</Notice>}
      <div className="flex flex-wrap gap-3">
        <Button variant="secondary" disabled={rows.length >= MAX_READINGS} onClick={() => setRows((rs) => [...rs, emptyRow(positions[Math.min(rs.length, positions.length - 1)]!)])}>Add a reading</Button>
        <Button type="submit" busy={busy}>Calibrate</Button>
      </div>
      {busy && <p className="text-sm text-ink-muted" role="status">Fitting the model to your readings…</p>}
    </form>
  );
}

function RowField({ label, error, children }: { label: string; error?: string; children: (ids: { id: string; "aria-invalid"?: boolean; "aria-describedby"?: string; "aria-label": string }) => React.ReactNode }) {
  const id = useId();
  return (
    <div className="min-w-0 space-y-1">
      <label htmlFor={id} className="block text-xs font-medium text-ink-soft">{label}</label>
      {children({ id, "aria-invalid": error ? true : undefined, "aria-describedby": error ? `${id}-error` : undefined, "aria-label": label })}
      {error && <p id={`${id}-error`} role="alert" className="text-xs font-medium text-danger-600">{error}</p>}
    </div>
  );
}

function CalibrationView({
  calibration: c,
  unitSystem,
  routeName,
  ceilings,
}: {
  calibration: StoredCalibration;
  unitSystem: UnitSystem;
  routeName: string;
  ceilings: Partial<Record<ReadingPosition, number>>;
}) {
  const t = (x: number) => formatTemperature(x, unitSystem);
  /** A modelled temperature; at or past the brake's validity ceiling no number is shown (docs/model.md). */
  const model = (x: number, i: number) => (x >= (ceilings[c.readings[i]!.position] ?? Infinity) ? BEYOND_RANGE_TEXT : t(x));
  const where = (i: number) => {
    const r = c.readings[i]!;
    return `${POSITION_TEXT[r.position]} at ${formatDistance(r.atM, unitSystem)}, ${r.minutesAfterStop > 0 ? `${r.minutesAfterStop} min after stopping` : "at once"}`;
  };
  const fitted = (k: "coolingFactor" | "engineBrakingScale") => c.fittedParameters.includes(k);
  return (
    <div className="space-y-4" data-testid="calibration-result">
      <p className="text-sm">
        Calibrated on {c.fittedAt.slice(0, 10)} from {c.readings.length} reading{c.readings.length === 1 ? "" : "s"} on {routeName}.
      </p>
      <dl className="grid grid-cols-1 gap-3 sm:grid-cols-3" data-testid="fitted-factors">
        <div className="rounded-lg border border-line bg-surface px-3 py-2">
          <dt className="text-xs text-ink-muted">Cooling factor {fitted("coolingFactor") ? "(fitted)" : "(kept)"}</dt>
          <dd className="text-lg font-semibold">{c.fitted.coolingFactor.toFixed(2)}</dd>
        </div>
        <div className="rounded-lg border border-line bg-surface px-3 py-2">
          <dt className="text-xs text-ink-muted">Engine-braking scale {fitted("engineBrakingScale") ? "(fitted)" : "(kept, not fitted)"}</dt>
          <dd className="text-lg font-semibold">{c.fitted.engineBrakingScale.toFixed(2)}</dd>
        </div>
        <div className="rounded-lg border border-line bg-surface px-3 py-2">
          <dt className="text-xs text-ink-muted">Typical miss, before → after</dt>
          <dd className="text-lg font-semibold">{formatTemperatureDifference(c.rmsBeforeK, unitSystem).replace(/^[+±]/, "")} → {formatTemperatureDifference(c.rmsAfterK, unitSystem).replace(/^[+±]/, "")}</dd>
        </div>
      </dl>
      {c.notes.filter((n) => !n.includes("see flagged")).map((n) => <Notice key={n} tone="caution">{n}</Notice>)}
      <div>
        <h3 className="mb-2 text-sm font-semibold">Model against your readings</h3>
        <ul className="grid gap-2 sm:grid-cols-2 xl:grid-cols-3" data-testid="calibration-readings">
          {c.results.map((r) => (
            <li key={r.reading} className="rounded-lg border border-line px-3 py-2 text-sm">
              <p className="font-medium">Reading {r.reading + 1}: {where(r.reading)}</p>
              <dl className="mt-1 grid grid-cols-2 gap-x-3 gap-y-0.5">
                <dt className="text-ink-muted">Read</dt><dd>{t(c.readings[r.reading]!.tempC)}</dd>
                <dt className="text-ink-muted">Model before</dt><dd>{model(r.modelBeforeC, r.reading)}</dd>
                <dt className="text-ink-muted">Model after</dt><dd>{model(r.modelAfterC, r.reading)}</dd>
                <dt className="text-ink-muted">Reading − model</dt><dd>{formatTemperatureDifference(r.residualK, unitSystem)}</dd>
              </dl>
            </li>
          ))}
        </ul>
      </div>
      {c.flagged.length > 0 && (
        <Notice tone="caution" title={`${c.flagged.length} reading${c.flagged.length === 1 ? "" : "s"} left out of the fit`}>
          <ul className="list-disc space-y-1 pl-5" data-testid="calibration-flagged">
            {c.flagged.map((f) => (
              <li key={f.reading}>
                Reading {f.reading + 1} ({where(f.reading)}, {t(c.readings[f.reading]!.tempC)}): {f.reason}.
              </li>
            ))}
          </ul>
          <p className="mt-2">A wrong position, a dragging or failed brake, or a reading taken long after stopping are the usual causes. Have that brake checked.</p>
        </Notice>
      )}
    </div>
  );
}

function ClearCalibration({ rigId, onCleared }: { rigId: string; onCleared: () => void }) {
  const router = useRouter();
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState(false);
  if (!asking) return <Button variant="secondary" onClick={() => setAsking(true)}>Clear the calibration</Button>;
  const clear = async () => {
    setBusy(true);
    try {
      await api(`/api/rigs/${rigId}/calibration`, { method: "DELETE" });
      toast.success("Calibration cleared. Heat runs use the model's typical values again.");
      onCleared();
      router.refresh();
    } catch (error) {
      toast.error((error as Error).message);
    } finally {
      setBusy(false);
      setAsking(false);
    }
  };
  return (
    <div className="flex flex-wrap items-center gap-2 rounded-lg border border-danger-600/30 bg-danger-50 px-3 py-2" role="group" aria-label="Confirm clearing">
      <span className="text-sm">Clear the calibration? Plans and heat runs go back to the model&apos;s typical values.</span>
      <Button variant="danger" busy={busy} onClick={clear}>Clear it</Button>
      <Button variant="ghost" onClick={() => setAsking(false)}>Keep it</Button>
    </div>
  );
}

type Forecast = AnalysisResult & { calibration: CalibrationUse | null };

function Reforecast({ rigId, calibration, unitSystem, routeName }: { rigId: string; calibration: StoredCalibration; unitSystem: UnitSystem; routeName: string }) {
  const run = (mode: "apply" | "ignore") => () =>
    api<{ analysis: Forecast }>("/api/analyses", { body: { rigId, routeId: calibration.routeId, detail: "none", calibration: mode } }).then((r) => r.analysis);
  const withFit = useQuery({ queryKey: ["calibrated-forecast", rigId, calibration.fittedAt, "apply"], queryFn: run("apply"), retry: false });
  const without = useQuery({ queryKey: ["calibrated-forecast", rigId, calibration.fittedAt, "ignore"], queryFn: run("ignore"), retry: false });
  return (
    <div>
      <h3 className="text-sm font-semibold">{routeName}, forecast again</h3>
      <p className="mb-3 text-xs text-ink-muted">The quick heat run of this rig on the route of the readings, with the standard descent speeds.</p>
      <div className="grid gap-4 md:grid-cols-2" data-testid="calibration-forecast">
        <ForecastCard title="Uncalibrated (typical values)" query={without} unitSystem={unitSystem} />
        <ForecastCard title="With the calibration" query={withFit} unitSystem={unitSystem} />
      </div>
    </div>
  );
}

function ForecastCard({ title, query, unitSystem }: { title: string; query: { data?: Forecast; error: Error | null; isPending: boolean }; unitSystem: UnitSystem }) {
  const t = (c: number) => formatTemperature(c, unitSystem);
  const f = query.data;
  return (
    <section className="min-w-0 rounded-lg border border-line p-3 text-sm" aria-label={title}>
      <h4 className="mb-2 font-medium">{title}</h4>
      {query.isPending && <p className="text-ink-muted" role="status">Working out brake temperatures…</p>}
      {query.error && <Notice tone="danger">{query.error instanceof ApiError && query.error.status === 404 ? "That route is no longer kept." : query.error.message}</Notice>}
      {f && (
        <div className="space-y-2">
          <ul className="space-y-0.5">
            {f.peaks.map((p) => (
              <li key={p.position}>
                Hottest {p.position}: <strong>{p.beyondValidity ? "beyond Fadeline's range" : t(p.peakC)}</strong> at {formatDistance(p.atM, unitSystem)}
              </li>
            ))}
          </ul>
          <p>Worst: {CLASS_TEXT[f.worstClass]}</p>
          {f.calibration && <p className="text-xs text-ink-muted">{calibrationNote(f.calibration)}</p>}
        </div>
      )}
    </section>
  );
}
