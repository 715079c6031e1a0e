"use client";

import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import { Button, Spinner } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";

/** Requests in flight, so a re-mounted runner waits for the same request instead of sending another. */
const inFlight = new Map<string, Promise<unknown>>();
function computeOnce(planId: string, planRigId: string, attempt: number): Promise<unknown> {
  const key = `${planId}/${planRigId}/${attempt}`;
  let request = inFlight.get(key);
  if (!request) {
    request = api(`/api/plans/${planId}/heat-runs`, { method: "POST", body: { planRigIds: [planRigId] } });
    inFlight.set(key, request);
    request.catch(() => inFlight.delete(key));
  }
  return request;
}

/**
 * Runs the heat model and the advice for the convoy's rigs whose results are missing or out of date, one rig
 * per request so the page can say how far it has got, then reloads the plan. Nothing out of date is shown
 * meanwhile: the plan page only draws results whose inputs match the plan as it is now.
 */
export function PlanRunner({ planId, pending, total }: { planId: string; pending: { planRigId: string; label: string; rigName: string }[]; total: number }) {
  const router = useRouter();
  const [done, setDone] = useState(0);
  const [problem, setProblem] = useState<string | null>(null);
  const [attempt, setAttempt] = useState(0);
  useEffect(() => {
    let live = true;
    (async () => {
      setProblem(null);
      for (let k = 0; k < pending.length; k++) {
        if (!live) return;
        setDone(k);
        await computeOnce(planId, pending[k]!.planRigId, attempt);
      }
      if (!live) return;
      setDone(pending.length);
      router.refresh();
    })().catch((error: unknown) => live && setProblem((error as Error).message));
    return () => {
      live = false;
    };
  }, [attempt, pending, planId, router]);

  const current = pending[Math.min(done, pending.length - 1)];
  const fresh = total - pending.length;
  return (
    <div data-testid="plan-runner">
    <Card className="p-6">
      {problem ? (
        <Notice tone="danger" title="The heat runs did not finish">
          <p>{problem}</p>
          <Button className="mt-3" variant="secondary" onClick={() => setAttempt((a) => a + 1)}>Try again</Button>
        </Notice>
      ) : (
        <div role="status" aria-live="polite">
          <p className="flex items-center gap-2 font-semibold">
            <Spinner /> Running the brake-heat model and the advice
          </p>
          <p className="mt-1 text-sm text-ink-soft">
            {done < pending.length ? `Rig ${fresh + done + 1} of ${total}: ${current?.label} (${current?.rigName}).` : "Done: loading the results."}{" "}
            {fresh > 0 && `${fresh} ${fresh === 1 ? "rig was" : "rigs were"} already up to date.`}
          </p>
          <progress className="mt-3 h-2 w-full overflow-hidden rounded-full accent-pine-700" max={pending.length} value={done} aria-label="Heat runs done" />
          <p className="mt-2 text-xs text-ink-muted">Each rig takes a few seconds on a long route. Results are kept, so this happens only after the plan, a rig or the model changes.</p>
        </div>
      )}
    </Card>
    </div>
  );
}
