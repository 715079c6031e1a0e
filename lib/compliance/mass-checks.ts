/**
 * Ratings against actual masses (docs/trade-facts.md §1.1: GVM includes the tow-ball mass; GCM covers the loaded
 * vehicle plus the loaded trailer; loaded mass must not exceed any rating — state road-safety checklist [src]).
 */

import { rigMasses, type Rig } from "@/lib/thermal";
import type { MassCheck } from "./types";

/**
 * Compare each rating with the rig's actual mass.
 * @param rig the rig (validated)
 * @returns one check per rating: GVM, GCM, towing capacity, tow ball, ATM, GTM, front and rear axle
 * @example checkMasses(UTE_AND_CARAVAN).find((c) => c.id === "gvm")?.status // "ok"
 */
export function checkMasses(rig: Rig): MassCheck[] {
  const { vehicle, trailer, load } = rig;
  const m = rigMasses(rig);
  const ballNote =
    m.towBallSource === "estimate" && !load.towBall
      ? "Includes a tow-ball mass estimated at 10 % of the trailer (common practice): weigh it."
      : m.towBallSource === "estimate"
        ? "Includes the tow-ball mass you estimated."
        : null;
  const checks: MassCheck[] = [
    check("gvm", "Tow vehicle as loaded, including the tow-ball mass, against its GVM", m.vehicleKg, vehicle.gvmKg, ballNote),
    check("gcm", "Whole combination as loaded against the GCM", m.combinationKg, vehicle.gcmKg, null),
  ];
  if (trailer) {
    checks.push(
      check("towing-capacity", "Trailer as loaded against the rated towing capacity", m.trailerKg, vehicle.towingCapacityKg, null),
      check("tow-ball", "Tow-ball mass against the tow-ball limit", m.towBallKg, vehicle.towBallLimitKg, ballNote),
      check("atm", "Trailer as loaded against its ATM", m.trailerKg, trailer.atmKg, null),
    );
    if (trailer.gtmKg !== undefined) {
      checks.push(check("gtm", "Trailer mass on its axles against its GTM", m.trailerAxlesKg, trailer.gtmKg, ballNote));
    }
  }
  checks.push(
    axleCheck("front-axle", "Front axle (weighbridge) against its rating", load.measuredAxleKg?.front, vehicle.frontAxleRatingKg),
    axleCheck("rear-axle", "Rear axle (weighbridge) against its rating", load.measuredAxleKg?.rear, vehicle.rearAxleRatingKg),
  );
  return checks;
}

/** @private */
function check(id: MassCheck["id"], label: string, actualKg: number, limitKg: number, note: string | null): MassCheck {
  const marginKg = limitKg - actualKg;
  return { id, label, actualKg, limitKg, marginKg, status: marginKg >= 0 ? "ok" : "over", note };
}

/** @private */
function axleCheck(id: MassCheck["id"], label: string, actualKg: number | undefined, limitKg: number | undefined): MassCheck {
  if (actualKg === undefined || limitKg === undefined) {
    const missing = actualKg === undefined ? "weigh each axle with the trailer coupled" : "enter the axle rating";
    return { id, label, actualKg: actualKg ?? null, limitKg: limitKg ?? null, marginKg: null, status: "not-checked", note: `Not checked: ${missing}.` };
  }
  return check(id, label, actualKg, limitKg, null);
}
