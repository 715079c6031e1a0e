/**
 * Cautions in our own words (docs/trade-facts.md §6). They go with every printed or shown piece of advice, and
 * the standstill cautions with every cool-down stop (docs/trade-facts.md §5.1). The infrared-thermometer check
 * is common practice, no published source (docs/trade-facts.md §5.3), not a published rule.
 */

/** Cautions that go with all advice. */
export const GENERAL_CAUTIONS: readonly string[] = [
  "These are estimates from a model, not measurements: real brakes, loads and roads differ.",
  "Follow the vehicle maker's ratings and the local road rules; they come first.",
  "Have the brakes, and any trailer brakes, inspected by a licensed mechanic.",
  "At stops, check hub and drum temperatures side by side with an infrared thermometer (common practice): " +
    "a wheel much hotter or much cooler than its pair needs a closer look.",
  "If the brakes start to fade, use engine braking and stop where it is safe, or use an escape ramp: don't wait for the plan to say so.",
  "Don't read the plan while driving; have a passenger read it out.",
];

/** Cautions for standing still with hot brakes. */
export const STANDSTILL_CAUTIONS: readonly string[] = [
  "Pull over only where it is safe and legal to stop.",
  "Don't sit with your foot on the brake pedal: pads held against hot discs keep them hot. Hold the rig in Park or in gear.",
  "Don't set the park brake on very hot drums, as they can bind: chock the wheels and leave it in gear or Park.",
  "Don't pour water on hot brakes.",
];
