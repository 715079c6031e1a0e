"use client";

import { renderDescentAdvice, type RigAdvice } from "@/lib/advice";
import type { UnitSystem } from "@/lib/units";
import { Button } from "@/components/ui/button";
import { CLASS_LABELS, HEAT_COLOURS } from "@/components/plan-view/heat-colours";

/**
 * A rig's advice, descent by descent, in plain words: the plan first, then each piece of advice with the result
 * of re-running the model with it, the stopping distances, and the cautions for standing with hot brakes.
 */
export function AdviceList({ advice, unitSystem, trailerNoun, onTry }: { advice: RigAdvice; unitSystem: UnitSystem; trailerNoun: string; onTry?: () => void }) {
  if (advice.descents.length === 0) {
    return <p className="text-sm text-ink-soft" data-testid="advice-none">No descent takes this rig&apos;s brakes to the caution line as planned: no advice needed.</p>;
  }
  return (
    <ol className="grid gap-4" data-testid="advice-list">
      {advice.descents.map((d) => {
        const text = renderDescentAdvice(d, unitSystem, { trailerNoun });
        const [plan, ...rest] = text.lines;
        return (
          <li key={d.descentIndex} className="rounded-lg border border-line bg-surface p-4" data-testid="descent-advice">
            <div className="flex flex-wrap items-start justify-between gap-2">
              <h3 className="font-semibold">
                ↓{d.descentIndex + 1} {text.title}
              </h3>
              <span className="flex items-center gap-1.5 text-xs text-ink-soft">
                <span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-full" style={{ background: HEAT_COLOURS[d.baseline.worstClass] }} />
                As planned: {CLASS_LABELS[d.baseline.worstClass].toLowerCase()}
              </span>
            </div>
            <p className={`mt-2 rounded-md px-3 py-2 text-sm ${d.nothingIsEnough ? "bg-danger-50 text-danger-700" : "bg-pine-50 text-ink"}`}>{plan}</p>
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
