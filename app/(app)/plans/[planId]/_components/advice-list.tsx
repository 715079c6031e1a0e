"use client";

import { renderDescentAdvice, type RigAdvice } from "@/lib/advice";
import { bandNoteText } from "@/lib/advice/render";
import type { UnitSystem } from "@/lib/units";
import { Button } from "@/components/ui/button";
import { CLASS_LABELS, HEAT_COLOURS } from "@/components/plan-view/heat-colours";
import { ceilingsByPosition } from "@/components/plan-view/heat-text";

/** The mass ratings and trailer-brake rules a rig fails: they make it "not advised", so they come first. */
export function LegalReasons({ reasons, who }: { reasons: readonly string[]; who?: string }) {
  if (reasons.length === 0) return null;
  return (
    <div className="rounded-md border border-danger-600/30 bg-danger-50 px-3 py-2 text-sm text-danger-700" data-testid="legal-reasons">
      <p className="font-semibold">Not advised as loaded{who ? `: ${who}` : ""}</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        {reasons.map((r) => (
          <li key={r}>{r}</li>
        ))}
      </ul>
    </div>
  );
}

/**
 * A rig's advice, descent by descent, in plain words: the ratings and rules it fails first, then per descent the
 * plan (marked "not enough" whenever the proven plan leaves a brake past a line), the uncertainty note when the
 * band straddles a line, each piece of advice with the result of re-running the model with it, the stopping
 * distances, and the cautions for standing with hot brakes.
 */
export function AdviceList({ advice, unitSystem, trailerNoun, onTry }: { advice: RigAdvice; unitSystem: UnitSystem; trailerNoun: string; onTry?: () => void }) {
  const ceilings = ceilingsByPosition(advice.proof[0]?.asPlanned.positions ?? []);
  if (advice.descents.length === 0) {
    return (
      <div className="grid gap-3">
        <LegalReasons reasons={advice.legalReasons} />
        <p className="text-sm text-ink-soft" data-testid="advice-none">No descent takes this rig&apos;s brakes to the caution line as planned: no advice needed.</p>
      </div>
    );
  }
  return (
    <ol className="grid gap-4" data-testid="advice-list">
      {advice.legalReasons.length > 0 && (
        <li className="list-none">
          <LegalReasons reasons={advice.legalReasons} />
        </li>
      )}
      {advice.descents.map((d) => {
        const text = renderDescentAdvice(d, unitSystem, { trailerNoun });
        const [plan, ...rest] = text.lines;
        const notEnough = d.nothingIsEnough || d.shortfall !== null;
        const notes = advice.uncertainty.filter((n) => n.descentIndex === d.descentIndex);
        return (
          <li key={d.descentIndex} className={`rounded-lg border bg-surface p-4 ${notEnough ? "border-danger-600/40" : "border-line"}`} data-testid="descent-advice" data-enough={notEnough ? "no" : "yes"}>
            <div className="flex flex-wrap items-start justify-between gap-2">
              <h3 className="font-semibold">
                ↓{d.descentIndex + 1} {text.title}
              </h3>
              <span className="flex items-center gap-1.5 text-xs text-ink-soft">
                <span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-full" style={{ background: HEAT_COLOURS[d.baseline.worstClass] }} />
                As planned: {CLASS_LABELS[d.baseline.worstClass].toLowerCase()}
              </span>
            </div>
            <p className={`mt-2 rounded-md px-3 py-2 text-sm ${notEnough ? "bg-danger-50 text-danger-700" : "bg-pine-50 text-ink"}`} data-testid="descent-plan">{plan}</p>
            {notes.map((n) => (
              <p key={n.line} className="mt-2 rounded-md border border-notice-600/30 bg-notice-50 px-3 py-2 text-sm" data-testid="band-note">
                {bandNoteText(n, unitSystem, trailerNoun, ceilings)}
              </p>
            ))}
            <ul className="mt-2 list-disc space-y-1 pl-5 text-sm text-ink-soft">
              {rest.map((line, i) => (
                <li key={i}>{line}</li>
              ))}
            </ul>
            {text.cautions.length > 0 && (
              <div className="mt-3 rounded-md border border-notice-600/30 bg-notice-50 px-3 py-2 text-xs text-ink">
                <p className="mb-1 font-semibold">When you stop with hot brakes</p>
                <ul className="list-disc space-y-0.5 pl-4">
                  {text.cautions.map((c) => (
                    <li key={c}>{c}</li>
                  ))}
                </ul>
              </div>
            )}
          </li>
        );
      })}
      {onTry && (
        <li className="list-none">
          <Button variant="secondary" onClick={onTry}>Try all this advice as a what-if</Button>
        </li>
      )}
    </ol>
  );
}
