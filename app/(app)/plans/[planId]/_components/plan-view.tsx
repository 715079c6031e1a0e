"use client";

/**
 * The plan page's working area: the verdict, the convoy matrix, and for one rig at a time the map and profile
 * coloured by brake temperature, the temperature chart per brake position, the advice with its proof, and a
 * live what-if run in the browser with the same lib/thermal the server uses.
 */
import Link from "next/link";
import { useCallback, useEffect, useMemo, useState } from "react";
import { ElevationProfile } from "@/components/elevation-profile/elevation-profile";
import { heatColouring, HEAT_COLOURS, CLASS_LABELS, type PositionThresholds } from "@/components/plan-view/heat-colours";
import { HeatChart } from "@/components/plan-view/heat-chart";
import { ceilingsByPosition, peakWithBand, worstPosition, type Edges } from "@/components/plan-view/heat-text";
import { GradeLegend } from "@/components/route-map/grade-legend";
import { RouteMap, type MapPin } from "@/components/route-map/route-map";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { adviseRig, GENERAL_CAUTIONS, shortfallText, speedLimitText, worstVerdict, type RigAdvice, type RunOutcome } from "@/lib/advice";
import { bandNotesText } from "@/lib/advice/render";
import { gearText, peakText } from "@/lib/advice/render-parts";
import type { PlanRigResult } from "@/lib/analysis/plan-run";
import { changesAnything, emptyWhatIf, runWhatIf, type WhatIfResult, type WhatIfSettings } from "@/lib/analysis/what-if";
import type { Descent, RouteView } from "@/lib/route";
import { peakBand, runBand, STEP_CLASSES, type HeatBand, type HeatRunOptions, type Rig } from "@/lib/thermal";
import { formatDistance, formatMass, formatTemperature, type UnitSystem } from "@/lib/units";
import { AdviceList, LegalReasons } from "./advice-list";
import { ConvoyMatrix } from "./convoy-matrix";
import { useRouteModel } from "./use-route-model";
import { WhatIfPanel, type SavedScenario } from "./what-if-panel";
import { positionLabel, trailerNoun, VERDICT_TEXT } from "./words";

/** One rig of the convoy with its current result. */
export interface PlanViewMember {
  planRigId: string;
  rigId: string;
  label: string;
  rigName: string;
  rig: Rig;
  options: HeatRunOptions;
  result: PlanRigResult;
}

const classRank = (c: string) => STEP_CLASSES.indexOf(c as (typeof STEP_CLASSES)[number]);

/**
 * @private The hottest sample of a trace over all positions, first one at or past its ceiling (docs/model.md,
 * "Validity ceiling"), with that position's ceiling.
 */
function hottest(distanceM: ArrayLike<number>, rotorC: ArrayLike<number>[], ceilingsC: readonly number[]) {
  let best = { atM: 0, c: -Infinity, ceilingC: Infinity, beyond: false };
  rotorC.forEach((col, j) => {
    const ceilingC = ceilingsC[j] ?? Infinity;
    for (let i = 0; i < col.length; i++) {
      const c = col[i] as number;
      const beyond = c >= ceilingC;
      if ((beyond && !best.beyond) || (beyond === best.beyond && c > best.c)) best = { atM: distanceM[i] as number, c, ceilingC, beyond };
    }
  });
  return best;
}

function PeakRow({ label, outcome, band, units }: { label: string; outcome: RunOutcome | null; band?: readonly Edges[] | null; units: UnitSystem }) {
  if (!outcome) return null;
  const j = worstPosition(outcome.positions);
  const p = outcome.positions[j]!;
  return (
    <div className="flex items-center justify-between gap-2">
      <dt className="text-ink-muted">{label}</dt>
      <dd className="flex items-center gap-1.5 text-right font-medium tabular-nums">
        <span aria-hidden="true" className="inline-block h-2 w-2 shrink-0 rounded-full" style={{ background: HEAT_COLOURS[outcome.worstClass] }} />
        {peakWithBand(p.peakC, p.ceilingC, band?.[j], units)} · {CLASS_LABELS[outcome.worstClass].toLowerCase()}
      </dd>
    </div>
  );
}

/** When the browser is idle (or soon, where it has no idle callback): the what-if's band waits for typing to pause. */
function whenIdle(work: () => void): () => void {
  if (typeof window.requestIdleCallback === "function") {
    const id = window.requestIdleCallback(work, { timeout: 300 });
    return () => window.cancelIdleCallback(id);
  }
  const id = window.setTimeout(work, 50);
  return () => window.clearTimeout(id);
}

export function PlanView({
  planId,
  view,
  descents,
  members,
  unitSystem: units,
  canEdit,
  scenarios: initialScenarios,
}: {
  planId: string;
  view: RouteView;
  descents: Descent[];
  members: PlanViewMember[];
  unitSystem: UnitSystem;
  canEdit: boolean;
  scenarios: SavedScenario[];
}) {
  const verdict = worstVerdict(members.map((m) => m.result.advice.verdict));
  const worstIndex = useMemo(() => {
    let w = 0;
    members.forEach((m, i) => {
      const a = members[w]!.result;
      const rank = (r: PlanRigResult) => classRank(r.analysis.worstClass) * 10_000 + Math.max(...r.analysis.peaks.map((p) => p.peakC));
      if (rank(m.result) > rank(a)) w = i;
    });
    return w;
  }, [members]);
  const [selectedId, setSelectedId] = useState(members[worstIndex]!.planRigId);
  const member = members.find((m) => m.planRigId === selectedId) ?? members[0]!;
  const { analysis, advice } = member.result;
  const noun = trailerNoun(member.rig);
  const [hoverM, setHoverM] = useState<number | null>(null);
  const [whatIf, setWhatIf] = useState<WhatIfSettings>(emptyWhatIf(member.planRigId));
  const [whatIfOpen, setWhatIfOpen] = useState(false);
  const [scenarios, setScenarios] = useState(initialScenarios);
  const [whatIfAdvice, setWhatIfAdvice] = useState<{ key: string; advice: RigAdvice | null; busy: boolean; error?: string } | null>(null);
  const model = useRouteModel(planId, whatIfOpen);

  const selectRig = (id: string) => {
    setSelectedId(id);
    setWhatIf(emptyWhatIf(id));
    setWhatIfAdvice(null);
  };
  const changeWhatIf = (s: WhatIfSettings) => {
    if (s.planRigId !== member.planRigId) {
      setSelectedId(s.planRigId);
    }
    setWhatIf(s);
    setWhatIfAdvice(null);
  };

  // The what-if runs on every change, in the browser.
  const run = useMemo((): { result: WhatIfResult; ms: number } | { error: string } | null => {
    if (!model.route || !changesAnything(whatIf) || whatIf.planRigId !== member.planRigId) return null;
    try {
      const t0 = performance.now();
      const result = runWhatIf(model.route, descents, member.rig, member.options, advice, whatIf);
      return { result, ms: performance.now() - t0 };
    } catch (error) {
      return { error: error instanceof Error ? error.message : String(error) };
    }
  }, [model.route, whatIf, member, descents, advice]);
  const whatIfRun = run && "result" in run ? run.result : null;

  // The what-if's band (lib/thermal runBand, about 20 ms on 300 km) runs after the nominal one, once the browser
  // is idle, so typing stays smooth; a newer what-if cancels a pending one.
  const [whatIfBand, setWhatIfBand] = useState<{ run: WhatIfResult; band: HeatBand | null; ms: number; error?: string } | null>(null);
  useEffect(() => {
    if (!model.route || !whatIfRun) return;
    const route = model.route;
    return whenIdle(() => {
      const t0 = performance.now();
      // The nominal run stands on its own; a band that fails says why in the status line.
      try {
        const band = runBand(route, whatIfRun.rig, whatIfRun.options, {}, whatIfRun.result);
        setWhatIfBand({ run: whatIfRun, band, ms: performance.now() - t0 });
      } catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        setWhatIfBand({ run: whatIfRun, band: null, ms: performance.now() - t0, error: message });
      }
    });
  }, [model.route, whatIfRun]);
  const bandNow = whatIfRun && whatIfBand?.run === whatIfRun ? whatIfBand : null;
  const whatIfEdges = useMemo(() => {
    if (!whatIfRun || !bandNow?.band) return null;
    const band = bandNow.band;
    return descents.map((d) =>
      whatIfRun.result.positions.map((_, j) => {
        const b = peakBand(band, j, d.startDistanceM, d.endDistanceM);
        return { lowC: b.lowC, highC: b.highC };
      }),
    );
  }, [whatIfRun, bandNow, descents]);

  const positions: PositionThresholds[] = analysis.positions.map((p) => ({ label: positionLabel(p.position, member.rig), warmC: p.thresholds.warmC, hotC: p.thresholds.hotC }));
  const planTrace = analysis.trace!;
  // eslint-disable-next-line react-hooks/exhaustive-deps
  const chartLabels = useMemo(() => positions.map((p) => p.label), [member.planRigId]);
  const ceilingsC = useMemo(() => analysis.positions.map((p) => p.validityCeilingC), [analysis]);
  const classTrace = whatIfRun ? { distanceM: whatIfRun.result.trace.distanceM, worstClass: whatIfRun.result.trace.worstClass } : { distanceM: planTrace.distanceM, worstClass: planTrace.worstClass };
  const colouringKey = `${member.planRigId}-${whatIfRun ? JSON.stringify(whatIf) : "plan"}-${units}`;
  // eslint-disable-next-line react-hooks/exhaustive-deps
  const colouring = useMemo(() => heatColouring(colouringKey, classTrace, positions, units), [colouringKey]);

  const pins = useMemo((): MapPin[] => {
    const out: MapPin[] = [];
    const hot = whatIfRun ? hottest(whatIfRun.result.trace.distanceM, whatIfRun.result.trace.rotorC, ceilingsC) : hottest(planTrace.distanceM, planTrace.rotorC, ceilingsC);
    if (Number.isFinite(hot.c)) out.push({ id: "hottest", distanceM: hot.atM, label: hot.beyond ? "Hottest: beyond Fadeline's range" : `Hottest ${peakText(hot.c, hot.ceilingC, units)}`, colour: "#16232a" });
    for (const d of advice.descents) {
      const p = d.plan.plan;
      if (p.gear !== undefined || p.speedMs !== undefined) out.push({ id: `gear-${d.descentIndex}`, distanceM: d.descent.startDistanceM, label: `↓${d.descentIndex + 1}: ${p.gear !== undefined ? `gear ${gearText(p.gear, d.highRangeGears)}` : ""}${p.gear !== undefined && p.speedMs !== undefined ? ", " : ""}${p.speedMs !== undefined ? speedLimitText(p.speedMs, units) : ""}`, colour: "#1f5a4f" });
      d.plan.stops.forEach((s, k) => out.push({ id: `stop-${d.descentIndex}-${k}`, distanceM: s.atM, label: `Stop ${Math.ceil(s.durationS / 60)} min`, colour: "#7a4b9b" }));
    }
    return out;
  }, [whatIfRun, planTrace, advice, units, ceilingsC]);

  const adviseWhatIf = useCallback(() => {
    if (!model.route || !whatIfRun) return;
    const key = JSON.stringify(whatIf);
    setWhatIfAdvice({ key, advice: null, busy: true });
    // Let the "working" note paint before the advice engine takes the main thread for a moment.
    setTimeout(() => {
      try {
        const base = { ...whatIf, applyAdvice: false };
        const again = runWhatIf(model.route!, descents, member.rig, member.options, null, base);
        const a = adviseRig({ route: model.route!, descents, rig: again.rig, options: again.options, waypoints: advice.waypoints, asPlanned: again.result });
        setWhatIfAdvice({ key, advice: a, busy: false });
      } catch (error) {
        setWhatIfAdvice({ key, advice: null, busy: false, error: (error as Error).message });
      }
    }, 30);
  }, [model.route, whatIfRun, whatIf, descents, member, advice.waypoints]);

  const verdictText = VERDICT_TEXT[verdict];
  // Why: the ratings and rules first (they decide on their own), then the descents where even the proven plan
  // leaves a brake past a line or where the brakes may fail as planned, then where a band straddles a line.
  const legal = members.filter((m) => m.result.advice.legalReasons.length > 0);
  const who = (m: PlanViewMember) => (members.length > 1 ? `${m.label}: ` : "");
  const heatReasons = members.flatMap((m) => {
    const n = trailerNoun(m.rig);
    return m.result.advice.descents.flatMap((d) => {
      const at = `↓${d.descentIndex + 1}`;
      if (d.shortfall !== null) return [`${who(m)}on ${at} the advice is not enough: ${shortfallText(d.shortfall, units, n)}.`];
      if (d.nothingIsEnough) return [`${who(m)}on ${at} no gear, held speed or cool-down stop keeps the brakes out of the fade range.`];
      if (d.baseline.worstClass === "runaway") return [`${who(m)}on ${at}, the brakes may fail (runaway) if driven as planned: follow the advice for this descent.`];
      return [];
    });
  });
  const uncertainty = members.flatMap((m) => {
    const ceilings = ceilingsByPosition(m.result.analysis.positions.map((p) => ({ position: p.position, ceilingC: p.validityCeilingC })));
    return bandNotesText(m.result.advice.uncertainty, units, trailerNoun(m.rig), ceilings).map((text) => `${who(m)}${text}`);
  });
  const weakest = members.filter((m) => m.result.advice.verdict === verdict);
  const gears = analysis.model.overallRatios.length;
  const busyNote = whatIfOpen
    ? model.status === "loading"
      ? "Loading the route for the what-if…"
      : model.status === "error"
        ? model.message!
        : run && "error" in run
          ? `The model refused this what-if: ${run.error}`
          : run && "ms" in run
            ? `Recomputed in the browser in ${run.ms.toFixed(0)} ms${bandNow ? (bandNow.band ? `; likely range in ${bandNow.ms.toFixed(0)} ms more` : `; the likely range could not be worked out (${bandNow.error})`) : "; working out the likely range…"}.`
            : null
    : null;

  return (
    <div className="grid grid-cols-1 gap-6">
      <section
        data-testid="plan-verdict"
        data-verdict={verdict}
        className={`rounded-[var(--radius-card)] border px-5 py-4 ${verdictText.tone === "pine" ? "border-pine-200 bg-pine-50" : verdictText.tone === "notice" ? "border-notice-600/30 bg-notice-50" : "border-danger-600/30 bg-danger-50"}`}
      >
        <p className="text-xs font-medium uppercase tracking-wide text-ink-muted">Verdict for the convoy</p>
        <p className="text-2xl font-semibold">{verdictText.title}</p>
        {legal.length > 0 && (
          <div className="mt-2 grid max-w-3xl gap-2">
            {legal.map((m) => (
              <LegalReasons key={m.planRigId} reasons={m.result.advice.legalReasons} who={`${m.label} (${m.rigName})`} />
            ))}
          </div>
        )}
        <p className="mt-2 max-w-3xl text-sm">{verdictText.meaning}</p>
        {heatReasons.length > 0 && (
          <ul className="mt-2 max-w-3xl list-disc space-y-1 pl-5 text-sm" data-testid="verdict-reasons">
            {heatReasons.map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
        )}
        {uncertainty.length > 0 && (
          <ul className="mt-2 max-w-3xl list-disc space-y-1 pl-5 text-sm" data-testid="verdict-uncertainty">
            {uncertainty.map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
        )}
        {members.length > 1 && verdict !== "clear" && weakest.length < members.length && (
          <p className="mt-1 text-sm">
            Judged by the weakest {weakest.length === 1 ? "rig" : "rigs"}: {weakest.map((m) => `${m.label} (${m.rigName})`).join(", ")}.
          </p>
        )}
      </section>

      <Card>
        <CardHeader title="Convoy" description="Peak brake temperature of each rig on each descent, as planned and with its advice. Pick a rig to see its map, chart and advice." />
        <ConvoyMatrix descents={descents} members={members} units={units} />
        <div className="flex flex-wrap gap-2 border-t border-line p-4" role="tablist" aria-label="Rig shown below">
          {members.map((m) => (
            <button
              key={m.planRigId}
              type="button"
              role="tab"
              aria-selected={m.planRigId === member.planRigId}
              onClick={() => selectRig(m.planRigId)}
              className={`rounded-full border px-3 py-1.5 text-sm ${m.planRigId === member.planRigId ? "border-pine-700 bg-pine-700 text-white" : "border-line bg-surface hover:bg-sunken"}`}
            >
              {m.label}: {VERDICT_TEXT[m.result.advice.verdict].title.toLowerCase()}
            </button>
          ))}
        </div>
      </Card>

      <Card className="overflow-hidden">
        <CardHeader
          title={`${member.label}: ${member.rigName}`}
          description={whatIfRun ? "Coloured by the what-if's brake temperatures (dashed in the chart)." : "Coloured by the brake temperatures as planned."}
          actions={<Link href={`/plans/${planId}/rigs/${member.planRigId}`} className="text-sm">Rig details and brake comparison</Link>}
        />
        <div className="p-2 sm:p-3">
          <RouteMap view={view} unitSystem={units} colouring={colouring} pins={pins} hoverDistanceM={hoverM} onHoverDistance={setHoverM} className="h-[340px] sm:h-[440px]" />
        </div>
        <div className="border-t border-line px-3 pt-3 pb-2 sm:px-5">
          <ElevationProfile view={view} unitSystem={units} colouring={colouring} hoverDistanceM={hoverM} onHoverDistance={setHoverM} height={180} />
          <HeatChart
            positions={chartLabels}
            warmC={Math.min(...positions.map((p) => p.warmC))}
            hotC={Math.min(...positions.map((p) => p.hotC))}
            ceilingsC={ceilingsC}
            trace={planTrace}
            band={planTrace.band ?? null}
            whatIf={whatIfRun ? whatIfRun.result.trace : null}
            whatIfBand={bandNow?.band ?? null}
            unitSystem={units}
            hoverDistanceM={hoverM}
            onHoverDistance={setHoverM}
          />
        </div>
        <GradeLegend colouring={colouring} unitSystem={units} className="border-t border-line px-3 py-3 sm:px-5" />
      </Card>

      <Card>
        <CardHeader
          title="What if…"
          description="Change this rig's conditions and see the chart, the map and the peaks follow at once. The model runs in your browser; the plan itself does not change."
          actions={!whatIfOpen && <Button variant="secondary" onClick={() => setWhatIfOpen(true)}>Open the what-if</Button>}
        />
        {whatIfOpen && (
          <div className="grid grid-cols-1 gap-5 p-5">
            <WhatIfPanel
              planId={planId}
              rig={member.rig}
              gears={gears}
              resolved={{ coolingFactor: analysis.model.params.coolingFactor, frontShare: analysis.model.params.frontShare ?? 0.65 }}
              settings={whatIf}
              onChange={changeWhatIf}
              unitSystem={units}
              canEdit={canEdit}
              scenarios={scenarios}
              onScenarioSaved={(s) => setScenarios((list) => [s, ...list])}
              busyNote={busyNote}
            />
            {whatIfRun && (
              <div className="grid gap-3 border-t border-line pt-4" data-testid="what-if-peaks" data-band={bandNow?.band ? "ready" : "pending"}>
                <h3 className="text-sm font-semibold">Descents with this what-if</h3>
                <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
                  {descents.map((d, i) => (
                    <dl key={i} className="rounded-md border border-line p-3 text-sm" data-testid="what-if-descent" data-class={whatIfRun.descents[i]!.worstClass}>
                      <p className="mb-1 font-semibold">↓{i + 1} at {formatDistance(d.startDistanceM, units)}</p>
                      <PeakRow label="As planned" outcome={advice.proof[i]!.asPlanned} band={advice.proof[i]!.band?.asPlanned} units={units} />
                      <PeakRow label="What-if" outcome={whatIfRun.descents[i]!} band={whatIfEdges?.[i]} units={units} />
                      <p className="mt-1 text-xs text-ink-muted">{whatIfRun.descents[i]!.positions.map((p, j) => `${positionLabel(p.position, member.rig)} ${peakWithBand(p.peakC, p.ceilingC, whatIfEdges?.[i]?.[j], units)}`).join(", ")}</p>
                    </dl>
                  ))}
                </div>
                <div className="flex flex-wrap items-center gap-2">
                  <Button variant="secondary" size="sm" onClick={adviseWhatIf} disabled={whatIfAdvice?.busy}>{whatIfAdvice?.busy ? "Working out advice…" : "Advise for this what-if"}</Button>
                  <span className="text-xs text-ink-muted">Runs the advice engine on the what-if (a moment on a long route).</span>
                </div>
                {whatIfAdvice?.error && <Notice tone="danger">{whatIfAdvice.error}</Notice>}
                {whatIfAdvice?.advice && whatIfAdvice.key === JSON.stringify(whatIf) && <AdviceList advice={whatIfAdvice.advice} unitSystem={units} trailerNoun={noun} />}
              </div>
            )}
          </div>
        )}
      </Card>

      <Card>
        <CardHeader
          title={`Advice for ${member.label}`}
          description={`${VERDICT_TEXT[advice.verdict].title}. Each piece of advice was run through the model again; its result is given beside it.`}
        />
        <div className="p-5">
          <AdviceList
            advice={advice}
            unitSystem={units}
            trailerNoun={noun}
            onTry={() => {
              setWhatIfOpen(true);
              changeWhatIf({ ...emptyWhatIf(member.planRigId), applyAdvice: true });
            }}
          />
        </div>
      </Card>

      <Notice tone="caution" title="Before you rely on this plan">
        <ul className="list-disc space-y-1 pl-4" data-testid="plan-cautions">
          {GENERAL_CAUTIONS.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
        <details className="mt-3" data-testid="model-assumptions">
          <summary className="cursor-pointer font-semibold">How these figures are made (the model&apos;s assumptions)</summary>
          <ul className="mt-2 list-disc space-y-1 pl-4 text-ink-soft">
            <li>Model {analysis.modelVersion}: energy balance of the combination on every step of the route, split between engine braking, the trailer brakes and the vehicle&apos;s front and rear brakes; convective and radiant cooling of each rotor and drum.</li>
            <li>Air {formatTemperature(analysis.model.params.ambientC, units)}; combination {formatMass(analysis.model.massKg, units)}{analysis.model.trailerKg > 0 ? `, of which the ${noun} ${formatMass(analysis.model.trailerKg, units)}` : ""}.</li>
            {analysis.positions.map((p) => (
              <li key={p.position}>
                {positionLabel(p.position, member.rig)}: {p.kind.replace("-", " ")} {formatMass(p.massKg, units)}, {p.padFamily}; caution from {formatTemperature(p.thresholds.warmC, units)}, fade likely from {formatTemperature(p.thresholds.hotC, units)} (estimates).
              </li>
            ))}
            {analysis.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
            <li>Stopping distances use a friction-versus-temperature fade curve of our own and are estimates of braking distance only.</li>
          </ul>
        </details>
      </Notice>
    </div>
  );
}
