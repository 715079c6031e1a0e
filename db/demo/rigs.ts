/**
 * The demo operator's and the caravan owner's rigs: invented, built from the generic presets of lib/thermal
 * with loads and brakes of our own choosing. Typical values, not any product.
 */
import { MID_SIZE_UTE, UTE_AND_CARAVAN, WAGON_AND_CAMPER, type Rig } from "../../lib/thermal";

export interface DemoRig {
  key: "lead-ute" | "ashcombe-van" | "pell-camper" | "holloway-van";
  name: string;
  rig: Rig;
}

const leadUte: Rig = { vehicle: { ...MID_SIZE_UTE, name: "Guide's dual-cab ute" }, load: { occupantsKg: 170, vehiclePayloadKg: 320, trailerLoadKg: 0 } };

const ashcombeVan: Rig = {
  ...UTE_AND_CARAVAN,
  vehicle: { ...UTE_AND_CARAVAN.vehicle, name: "Dual-cab ute" },
  trailer: { ...UTE_AND_CARAVAN.trailer!, name: "Tandem touring van" },
  load: { occupantsKg: 150, vehiclePayloadKg: 280, trailerLoadKg: 420 },
};

const pellCamper: Rig = {
  ...WAGON_AND_CAMPER,
  vehicle: { ...WAGON_AND_CAMPER.vehicle, name: "Large wagon" },
  trailer: { ...WAGON_AND_CAMPER.trailer!, name: "Off-road camper" },
};

const hollowayVan: Rig = {
  ...UTE_AND_CARAVAN,
  vehicle: { ...UTE_AND_CARAVAN.vehicle, name: "Dual-cab ute" },
  trailer: { ...UTE_AND_CARAVAN.trailer!, name: "Family van", controllerGain: 0.7 },
  load: { occupantsKg: 230, vehiclePayloadKg: 300, trailerLoadKg: 380 },
};

export const DEMO_TEAM_RIGS: DemoRig[] = [
  { key: "lead-ute", name: "Lead ute (guide)", rig: leadUte },
  { key: "ashcombe-van", name: "Ute and tandem van", rig: ashcombeVan },
  { key: "pell-camper", name: "Wagon and off-road camper", rig: pellCamper },
];

export const DEMO_OWNER_RIGS: DemoRig[] = [{ key: "holloway-van", name: "Our ute and the family van", rig: hollowayVan }];
