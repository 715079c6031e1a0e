import {
  LARGE_WAGON,
  MID_SIZE_UTE,
  PRESET_LABEL,
  SINGLE_AXLE_CAMPER,
  TANDEM_AXLE_CARAVAN,
  UTE_AND_CARAVAN,
  WAGON_AND_CAMPER,
  type Rig,
} from "@/lib/thermal";

/** The generic starting points a user can pick when describing a rig: typical values, not a product. */
export const RIG_PRESETS = {
  label: PRESET_LABEL,
  vehicles: { "mid-size-ute": MID_SIZE_UTE, "large-wagon": LARGE_WAGON },
  trailers: { "single-axle-camper": SINGLE_AXLE_CAMPER, "tandem-axle-caravan": TANDEM_AXLE_CARAVAN },
  rigs: { "ute-and-caravan": UTE_AND_CARAVAN, "wagon-and-camper": WAGON_AND_CAMPER } satisfies Record<string, Rig>,
} as const;
