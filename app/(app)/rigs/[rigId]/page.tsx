import type { Metadata } from "next";
import Link from "next/link";
import { getDb } from "@/db";
import { REGION_LABELS } from "@/lib/rig-form/regions";
import { SafetyCaution } from "@/components/safety-caution";
import { buttonClasses } from "@/components/ui/button";
import { Card, CardHeader, PageHeader } from "@/components/ui/card";
import { can } from "@/lib/auth/permissions";
import { listRoutes } from "@/lib/server/routes/routes-dal";
import { resolveModel, rigMasses } from "@/lib/thermal";
import { formatMass } from "@/lib/units";
import { ComplianceReportView } from "../_components/compliance-report";
import { CalibrationSection } from "../_components/calibration-section";
import { DeleteRigButton } from "../_components/delete-rig-button";
import { TryOnRoute } from "../_components/try-on-route";
import { loadRig } from "./load-rig";

export const metadata: Metadata = { title: "Rig" };

export default async function RigPage({ params }: { params: Promise<{ rigId: string }> }) {
  const { rigId } = await params;
  const { user, saved } = await loadRig(rigId, `/rigs/${rigId}`);
  const units = user.unitSystem;
  const masses = rigMasses(saved.rig);
  const { vehicle, trailer } = saved.rig;
  const routes = await listRoutes(getDb(), user, saved.organisationId);
  const figures: [string, string][] = [
    ["Tow vehicle as loaded", formatMass(masses.vehicleKg, units)],
    ["Trailer as loaded", trailer ? formatMass(masses.trailerKg, units) : "no trailer"],
    ["Tow-ball mass", trailer ? `${formatMass(masses.towBallKg, units)}${saved.rig.load.towBall?.source === "measured" ? " (weighed)" : " (estimate)"}` : "—"],
    ["Combination", formatMass(masses.combinationKg, units)],
  ];
  return (
    <>
      <PageHeader
        title={saved.name}
        description={`${vehicle.name}${trailer ? ` towing ${trailer.name}` : ", no trailer"}. Rules of ${REGION_LABELS[saved.region]}.`}
        actions={
          can(saved.role, "content.update") && (
            <div className="flex gap-2">
              <Link href={`/rigs/${saved.id}/edit`} className={buttonClasses("secondary") + " no-underline"}>Edit</Link>
              <DeleteRigButton rigId={saved.id} name={saved.name} />
            </div>
          )
        }
      />
      <dl className="mb-6 grid grid-cols-2 gap-3 lg:grid-cols-4" data-testid="rig-figures">
        {figures.map(([label, value]) => (
          <div key={label} className="rounded-lg border border-line bg-surface px-3 py-2">
            <dt className="text-xs text-ink-muted">{label}</dt>
            <dd className="text-lg font-semibold">{value}</dd>
          </div>
        ))}
      </dl>
      {masses.notes.length > 0 && <ul className="mb-6 list-disc pl-5 text-sm text-ink-muted">{masses.notes.map((n) => <li key={n}>{n}</li>)}</ul>}
      <ComplianceReportView report={saved.compliance} units={units} />
      <Card className="mt-6">
        <CardHeader title="Try it on a route" description="A quick heat run of this rig over one of your routes, with the standard descent speeds. Plans add advice and convoys." />
        <div className="p-5">
          <TryOnRoute rigId={saved.id} routes={routes.map((r) => ({ id: r.id, name: r.name }))} unitSystem={units} />
        </div>
      </Card>
      <Card className="mt-6">
        <CardHeader
          title="Calibrate from readings"
          description="Brake temperatures you read with an infrared thermometer at a cool-down stop tune this rig's cooling and engine braking in the model. Plans and quick heat runs then use the fit."
        />
        <div className="p-5">
          <CalibrationSection
            rigId={saved.id}
            canEdit={can(saved.role, "content.update")}
            unitSystem={units}
            routes={routes.map((r) => ({ id: r.id, name: r.name, lengthM: r.lengthM }))}
            positions={resolveModel(saved.rig).positions.map((p) => ({ position: p.position, validityCeilingC: p.validityCeilingC }))}
            initial={saved.calibration}
          />
        </div>
      </Card>
      <SafetyCaution className="mt-6" />
    </>
  );
}
