/**
 * lib/advice: the pure advice engine of Fadeline. For every descent where a rig reaches the warm (caution)
 * line or worse: gear, speed, cool-down stops where a rig can stand, trailer brakes, and a combined plan, or
 * when nothing is enough, which brake falls short, by how much, and what would change it; each re-run
 * through lib/thermal and carrying its result; the whole route re-run with all advice applied (the proof);
 * convoy verdicts; brake-setup comparison; text for drivers in metric or imperial.
 * Pure and isomorphic (no I/O, no Node-only imports); SI inside, temperatures in °C.
 */

export type * from "./types";
export { DEFAULT_ADVICE_SETTINGS, type AdviceSettings } from "./settings";
export { adviseRig, leadInIndex, type AdviseRigInput } from "./advise-rig";
export { adviseConvoy, worstCell, type ConvoyAdvice, type ConvoyCell, type ConvoyMember } from "./convoy";
export { rigVerdict, worstVerdict, VERDICTS } from "./verdict";
export { adviceOptions, proveAdvice } from "./prove";
export { adviseWithBands, withBands, judgeOnBand, type BandedAdvice } from "./band";
export { compareBrakeSetups, withBrakeSetup, type BrakeComparisonRow, type BrakeSetup, type SetupFigures } from "./compare-brakes";
export { stopDuration, stopTargets } from "./stop-plan";
export { shortfallOf } from "./shortfall";
export { outcomeOf, marginTo, isBelow } from "./outcome";
export { renderDescentAdvice, renderRigAdvice, distanceText, type DescentText, type RenderOptions } from "./render";
export { renderConvoy } from "./render-convoy";
export { CLASS_WORDS, ordinal, speedLimitText, shortfallText, stopText, stopsAddText } from "./render-parts";
export { GENERAL_CAUTIONS, STANDSTILL_CAUTIONS } from "./cautions";
