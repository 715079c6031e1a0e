import type { Verdict } from "@/lib/advice";
import type { BrakePosition, Rig } from "@/lib/thermal";

/** A verdict as the plan page says it, with what it means. */
export const VERDICT_TEXT: Readonly<Record<Verdict, { title: string; meaning: string; tone: "pine" | "notice" | "danger" }>> = {
  clear: { title: "Clear", meaning: "No brake reaches the caution line on any descent, driving as planned.", tone: "pine" },
  "clear with advice": {
    title: "Clear with advice",
    meaning: "Some descents need a lower gear, a slower speed or a cool-down stop. With the advice below, every brake stays out of the fade range.",
    tone: "notice",
  },
  "not advised": {
    title: "Not advised",
    meaning: "At least one rig should not make this trip as planned and loaded: the reasons are listed here. Consider another route, less load, or a brake upgrade assessed by a licensed mechanic.",
    tone: "danger",
  },
};

/** The trailer's word for this rig ("caravan", "camper", "trailer"). */
export function trailerNoun(rig: Rig): string {
  return rig.trailer?.kind === "camper" ? "camper" : rig.trailer?.kind === "other" ? "trailer" : "caravan";
}

/** A brake position's label for this rig. */
export function positionLabel(position: BrakePosition | string, rig: Rig): string {
  if (position === "front") return "Front";
  if (position === "rear") return "Rear";
  const noun = trailerNoun(rig);
  return noun[0]!.toUpperCase() + noun.slice(1);
}
