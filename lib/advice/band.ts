/**
 * How sure the advice is: the uncertainty band (lib/thermal ensemble, 10th–90th percentile over the uncertain
 * parameters) of every descent's peaks as planned and with the advice applied, and the verdict judged on the
 * band's upper edge (docs/model.md, "Uncertainty band" and "Verdict"): a plan whose upper edge reaches the
 * fade-likely line is not advised, and the advice says when the band straddles a line ("could reach fade on
 * descent 2").
 */

import type { Descent } from "@/lib/route";
import {
  peakBand,
  prepareRoute,
  runBand,
  runPrepared,
  validateRouteProfile,
  type BandSettings,
  type HeatBand,
  type HeatRunOptions,
  type HeatRunResult,
  type PreparedRoute,
  type Rig,
} from "@/lib/thermal";
import { adviseRig, type AdviseRigInput } from "./advise-rig";
import { adviceOptions } from "./prove";
import type { BandEdges, BandNote, RigAdvice, RunOutcome, Verdict } from "./types";

/** A rig's advice with its bands, and the band of the run as planned (for the heat trace). */
export interface BandedAdvice {
  advice: RigAdvice;
  plannedBand: HeatBand;
}

/**
 * Add the bands to a rig's advice and judge its verdict on their upper edges.
 * @param route the prepared route the advice was made on
 * @param descents the route's descents (as given to adviseRig)
 * @param rig the rig
 * @param options the plan's own options
 * @param advice the rig's advice (adviseRig)
 * @param asPlanned the run as planned (reused as the band's nominal)
 * @param settings band settings (default: lib/thermal's)
 * @returns the advice with `proof[i].band`, `uncertainty` notes and the verdict on the upper edge
 * @example withBands(route, descents, rig, options, advice, asPlanned).advice.uncertainty
 */
export function withBands(
  route: PreparedRoute,
  descents: readonly Descent[],
  rig: Rig,
  options: HeatRunOptions,
  advice: RigAdvice,
  asPlanned: HeatRunResult,
  settings: Partial<BandSettings> = {},
): BandedAdvice {
  const plannedBand = runBand(route, rig, options, settings, asPlanned);
  const advisedBand = advice.descents.length > 0 ? runBand(route, rig, adviceOptions(advice, options), settings) : plannedBand;
  const proof = advice.proof.map((p) => {
    const d = descents[p.descentIndex]!;
    return {
      ...p,
      band: {
        asPlanned: edgesFor(plannedBand, p.asPlanned, d.startDistanceM, d.endDistanceM),
        withAdvice: edgesFor(advisedBand, p.withAdvice, d.startDistanceM, d.endDistanceM),
      },
    };
  });
  const judged = judgeOnBand(advice.verdict, proof, advice.legalReasons.length > 0);
  const descentsWithBands = advice.descents.map((a) => ({ ...a, bands: proof.find((p) => p.descentIndex === a.descentIndex)!.band }));
  return {
    advice: { ...advice, descents: descentsWithBands, proof, verdict: judged.verdict, uncertainty: judged.notes },
    plannedBand,
  };
}

/**
 * @private Each position's band on a stretch, around the outcome's own peak: the band's offsets from its
 * nominal peak applied to the peak the advice reports, so the band always contains the number shown.
 */
function edgesFor(band: HeatBand, outcome: RunOutcome, startM: number, endM: number): BandEdges[] {
  return outcome.positions.map((pos, j) => {
    const b = peakBand(band, j, startM, endM);
    return { lowC: pos.peakC - (b.peakC - b.lowC), highC: pos.peakC + (b.highC - b.peakC) };
  });
}

/**
 * The verdict held against the bands' upper edges, with a note for every line a band straddles.
 * @param verdict the verdict from the heat traces (and the law)
 * @param proof every descent's outcomes with their bands
 * @param legal whether the rig fails a rating or rule (the verdict stays "not advised")
 * @returns the verdict and the notes
 * @example judgeOnBand("clear with advice", proof, false).notes[0] // { descentIndex: 1, line: "hot", hits: […] }
 */
export function judgeOnBand(
  verdict: Verdict,
  proof: readonly { descentIndex: number; asPlanned: RunOutcome; withAdvice: RunOutcome; band: { asPlanned: BandEdges[]; withAdvice: BandEdges[] } }[],
  legal: boolean,
): { verdict: Verdict; notes: BandNote[] } {
  let out = verdict;
  const notes: BandNote[] = [];
  for (const p of proof) {
    const straddles = (line: "warm" | "hot") =>
      p.withAdvice.positions.flatMap((pos, j) => {
        const limit = line === "warm" ? pos.warmC : pos.hotC;
        const high = (p.band.withAdvice[j] as BandEdges).highC;
        return pos.peakC < limit && high >= limit ? [{ position: pos.position, peakC: pos.peakC, highC: high, limitC: limit }] : [];
      });
    const fade = straddles("hot");
    if (fade.length > 0) {
      notes.push({ descentIndex: p.descentIndex, line: "hot", hits: fade });
      if (!legal) out = "not advised";
      continue;
    }
    // Caution is worth a note only where it changes the verdict: a plan may leave brakes in the caution band.
    const caution = straddles("warm");
    if (caution.length > 0 && verdict === "clear") {
      notes.push({ descentIndex: p.descentIndex, line: "warm", hits: caution });
      out = "clear with advice";
    }
  }
  return { verdict: out, notes };
}


/** Each further pass asks for this much more spread than the band showed (dimensionless). */
const PASS_SLACK = 1.1;
/** Most passes of the advice search (the first included). */
const MAX_PASSES = 3;

/**
 * A rig's advice judged on its bands, searched again where needed: when a pass leaves a descent whose band
 * reaches the fade-likely line with the advice applied, that descent is advised again judging each plan on
 * its estimated upper edge (settings.bandSpreads: the spread the band showed, × 1.1, and at least 1.5 × the
 * spread already asked for), up to three passes in all. The pass kept is the one with the fewest such
 * descents that gives up on no descent the first pass could advise.
 * @param input as for adviseRig
 * @param band band settings (default: lib/thermal's)
 * @returns the advice with its bands, and the band of the run as planned
 * @example adviseWithBands({ route: profile, descents, rig: UTE_AND_CARAVAN }).advice.verdict
 */
export function adviseWithBands(input: AdviseRigInput, band: Partial<BandSettings> = {}): BandedAdvice {
  const route = "pathM" in input.route ? input.route : prepareRoute(validateRouteProfile(input.route), input.descents);
  const options = input.options ?? {};
  const asPlanned = input.asPlanned ?? runPrepared(route, input.rig, options);
  const ambientC = asPlanned.model.params.ambientC;
  const pass = (spreads: Record<number, number>) => {
    const settings = { ...input.settings, bandSpreads: spreads };
    return withBands(route, input.descents, input.rig, options, adviseRig({ ...input, route, asPlanned, settings }), asPlanned, band);
  };
  const fades = (b: BandedAdvice) => b.advice.uncertainty.filter((n) => n.line === "hot");
  const gaveUp = (b: BandedAdvice) => new Set(b.advice.descents.filter((d) => d.nothingIsEnough).map((d) => d.descentIndex));
  const first = pass({ ...input.settings?.bandSpreads });
  const firstGaveUp = gaveUp(first);
  let best = first;
  let latest = first;
  const spreads: Record<number, number> = { ...input.settings?.bandSpreads };
  for (let n = 1; n < MAX_PASSES && fades(latest).length > 0; n++) {
    for (const note of fades(latest)) {
      const seen = Math.max(...note.hits.map((h) => (h.highC - h.peakC) / Math.max(1, h.peakC - ambientC)));
      const asked = spreads[note.descentIndex] ?? 0;
      spreads[note.descentIndex] = Math.max(PASS_SLACK * seen, 1.5 * asked);
    }
    latest = pass({ ...spreads });
    const newlyGivenUp = [...gaveUp(latest)].some((i) => !firstGaveUp.has(i));
    if (!newlyGivenUp && fades(latest).length < fades(best).length) best = latest;
  }
  return best;
}
