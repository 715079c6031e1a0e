import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import type { ComplianceReport, RuleSource } from "@/lib/compliance";
import { formatMass, type UnitSystem } from "@/lib/units";

const STATUS: Record<string, { tone: "pine" | "danger" | "neutral"; text: string }> = {
  ok: { tone: "pine", text: "Within" },
  over: { tone: "danger", text: "Over" },
  "not-checked": { tone: "neutral", text: "Not checked" },
};
const VERDICT: Record<string, { tone: "pine" | "danger" | "notice" | "neutral"; text: string }> = {
  meets: { tone: "pine", text: "Meets the rule" },
  "does-not-meet": { tone: "danger", text: "Short of the rule" },
  unclear: { tone: "notice", text: "Unclear: check" },
  "outside-rule": { tone: "neutral", text: "Outside this rule" },
};

function Sources({ sources }: { sources: RuleSource[] }) {
  return (
    <ul className="mt-1 space-y-0.5 text-xs text-ink-muted">
      {sources.map((s) => (
        <li key={s.title}>
          {s.tag === "src" ? "Official: " : s.tag === "2nd" ? "Secondary: " : "From memory: "}
          {s.url && /^https?:\/\//.test(s.url) ? <a href={s.url} rel="noreferrer noopener" target="_blank" className="underline">{s.title}</a> : s.title}
        </li>
      ))}
    </ul>
  );
}

/** A rig's mass compliance: every rating, the trailer-brake rule of its region, rules of thumb and the payload trap. */
export function ComplianceReportView({ report, units }: { report: ComplianceReport; units: UnitSystem }) {
  const kg = (x: number | null) => (x === null ? "—" : formatMass(x, units));
  const brakes = report.trailerBrakes;
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6" data-testid="compliance-report">
      <Card>
        <CardHeader title="Masses against ratings" description="Actual masses from your figures; a weighbridge reading in full touring trim is the only sure way." />
        <div className="overflow-x-auto p-5">
          <table className="w-full min-w-[32rem] text-left text-sm">
            <thead className="text-xs uppercase tracking-wide text-ink-muted">
              <tr><th className="py-2">Rating</th><th>Actual</th><th>Rating</th><th>Margin</th><th>Result</th></tr>
            </thead>
            <tbody className="divide-y divide-line">
              {report.checks.map((c) => (
                <tr key={c.id} data-testid={`check-${c.id}`}>
                  <td className="py-2 pr-3">{c.label}{c.note && <span className="block text-xs text-ink-muted">{c.note}</span>}</td>
                  <td>{kg(c.actualKg)}</td>
                  <td>{kg(c.limitKg)}</td>
                  <td>{kg(c.marginKg)}</td>
                  <td><Badge tone={STATUS[c.status]!.tone}>{STATUS[c.status]!.text}</Badge></td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </Card>
      {report.payloadTrap.applies && (
        <Notice tone="caution" title="Payload left at full tow">{report.payloadTrap.explanation}</Notice>
      )}
      {brakes && (
        <Card>
          <CardHeader title={`Trailer brakes: ${brakes.rule.title}`} actions={<Badge tone={VERDICT[brakes.verdict]!.tone}>{VERDICT[brakes.verdict]!.text}</Badge>} />
          <div className="space-y-2 p-5 text-sm">
            <p>{brakes.rule.summary}</p>
            {brakes.requirement && <p><strong>At {kg(brakes.massKg)}:</strong> {brakes.requirement.text}</p>}
            <ul className="list-disc pl-5">{brakes.reasons.map((r) => <li key={r}>{r}</li>)}</ul>
            <Sources sources={brakes.rule.sources} />
            <p className="text-xs text-ink-muted">Last checked {brakes.rule.lastChecked.date} against {brakes.rule.lastChecked.against}. Rules change: confirm with the regulator.</p>
          </div>
        </Card>
      )}
      {report.rulesOfThumb.length > 0 && (
        <Card>
          <CardHeader title="Rules of thumb" description="Common practice, not law." />
          <ul className="space-y-3 p-5 text-sm">
            {report.rulesOfThumb.map((r) => (
              <li key={r.id}>
                <span className="font-medium">{r.title}</span>{" "}
                {r.withinGuideline !== null && <Badge tone={r.withinGuideline ? "pine" : "notice"}>{r.withinGuideline ? "within" : "outside"}</Badge>}
                <p className="text-ink-soft">{r.explanation}</p>
                <Sources sources={r.sources} />
              </li>
            ))}
          </ul>
        </Card>
      )}
    </div>
  );
}

/** One word for the list: the worst of the rig's checks. */
export function complianceStatus(report: ComplianceReport): { tone: "pine" | "danger" | "notice"; text: string } {
  if (report.checks.some((c) => c.status === "over")) return { tone: "danger", text: "Over a rating" };
  if (report.trailerBrakes?.verdict === "does-not-meet") return { tone: "danger", text: "Trailer brakes short of the rule" };
  if (report.trailerBrakes?.verdict === "unclear" || report.payloadTrap.applies) return { tone: "notice", text: "Within ratings, check notes" };
  return { tone: "pine", text: "Within ratings" };
}
