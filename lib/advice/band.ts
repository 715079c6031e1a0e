/**
 * How sure the advice is: the uncertainty band (lib/thermal ensemble, 10th–90th percentile over the uncertain
 * parameters) of every descent's peaks as planned and with the advice applied, and the verdict judged on the
 * band's upper edge (docs/model.md, "Uncertainty band" and "Verdict"): a plan whose upper edge reaches the
 * fade-likely line is not advised, and the advice says when the band straddles a line ("could reach fade on
 * descent 2").
 */

import type { Descent } from "@/lib/route";
import { peakBand, runBand, type BandSettings, type HeatBand, type HeatRunOptions, type HeatRunResult, type PreparedRoute, type Rig } from "@/lib/thermal";
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
        return pos.peakC < limit && high >= limit ? [{ position: pos.position, highC: high, limitC: limit }] : [];
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

