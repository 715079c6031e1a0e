"use client";

import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { controlClasses } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import type { AnalysisResult } from "@/lib/analysis/analyze";
import { calibrationNote, type CalibrationUse } from "@/lib/analysis/calibration-note";
import { api } from "@/lib/client/api";
import { formatDistance, type UnitSystem } from "@/lib/units";
import { peakWithBand } from "@/components/plan-view/heat-text";

const CLASS_TEXT: Record<string, string> = { cool: "cool", warm: "warm (caution)", hot: "hot (fade likely)", "boil-risk": "boil risk (brake fluid)", runaway: "runaway (brakes may fail)" };

export function TryOnRoute({ rigId, routes, unitSystem }: { rigId: string; routes: { id: string; name: string }[]; unitSystem: UnitSystem }) {
  const [routeId, setRouteId] = useState(routes[0]?.id ?? "");
  const run = useMutation({ mutationFn: () => api<{ analysis: AnalysisResult & { calibration: CalibrationUse | null } }>("/api/analyses", { body: { rigId, routeId, detail: "none" } }).then((r) => r.analysis) });
  if (routes.length === 0) return <p className="text-sm text-ink-muted">Upload a route first, on Routes.</p>;
  // A peak with its band, "about 240 °C (210–290)"; at or past the brake's ceiling "beyond Fadeline's range".
  const ceiling = (position: string) => run.data?.positions.find((p) => p.position === position)?.validityCeilingC ?? Infinity;
  const t = (p: { position: string; peakC: number; beyondValidity: boolean; band?: { lowC: number; highC: number } }) =>
    peakWithBand(p.peakC, p.beyondValidity ? -Infinity : ceiling(p.position), p.band, unitSystem);
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3">
        <label className="text-sm">
          <span className="mb-1 block font-medium">Route</span>
          <select value={routeId} onChange={(e) => setRouteId(e.target.value)} className={`${controlClasses(false)} h-10 w-72`}>
            {routes.map((r) => <option key={r.id} value={r.id}>{r.name}</option>)}
          </select>
        </label>
        <Button onClick={() => run.mutate()} busy={run.isPending}>Run the model</Button>
      </div>
      {run.isPending && <p className="text-sm text-ink-muted" role="status">Working out brake temperatures along the route…</p>}
      {run.isError && <Notice tone="danger">{run.error.message}</Notice>}
      {run.data && (
        <div className="space-y-2" data-testid="try-result">
          <p className="text-sm">
            Hottest on the route: {run.data.peaks.map((p) => `${p.position} ${t(p)} at ${formatDistance(p.atM, unitSystem)}`).join("; ")}. Worst: {CLASS_TEXT[run.data.worstClass]}.
          </p>
          <div className="overflow-x-auto">
            <table className="w-full min-w-[28rem] text-left text-sm">
              <thead className="text-xs uppercase text-ink-muted"><tr><th className="py-1">Descent</th>{run.data.positions.map((p) => <th key={p.position}>{p.position} peak</th>)}<th>Class</th></tr></thead>
              <tbody className="divide-y divide-line">
                {run.data.descents.map((d, i) => (
                  <tr key={i}>
                    <td className="py-1">{formatDistance(d.startM, unitSystem)} – {formatDistance(d.endM, unitSystem)}</td>
                    {d.positions.map((p) => <td key={p.position}>{t(p)}</td>)}
                    <td>{CLASS_TEXT[d.worstClass]}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <p className="text-xs text-ink-muted">
            {run.data.calibration ? `Estimates from a physical model. ${calibrationNote(run.data.calibration)}` : "Estimates from a physical model with typical values."} Model {run.data.modelVersion}.
          </p>
        </div>
      )}
    </div>
  );
}
