import { Notice } from "./ui/notice";

/** The caution that runs through the whole product wherever a result could be acted on. */
export function SafetyCaution({ className }: { className?: string }) {
  return (
    <Notice tone="caution" title="Estimates, not guarantees" className={className}>
      Fadeline&apos;s figures come from a physical model with typical values, not from your brakes. Stay within
      your vehicle and trailer makers&apos; ratings, follow local road rules and signed speeds, and have your
      brakes checked by a licensed mechanic before a mountain trip.
    </Notice>
  );
}
