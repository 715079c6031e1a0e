"use client";

/**
 * The route page's map and profile with one shared hover: pointing at either shows the same point on both.
 * The hover distance lives here (not in either view) so a later descents table can join in the same way.
 */
import { useState } from "react";
import { ElevationProfile } from "@/components/elevation-profile/elevation-profile";
import { GradeLegend } from "@/components/route-map/grade-legend";
import { gradeColouring, type RouteColouring } from "@/components/route-map/grade-colours";
import { RouteMap } from "@/components/route-map/route-map";
import { Card } from "@/components/ui/card";
import { cx } from "@/components/ui/cx";
import type { RouteView } from "@/lib/route";
import type { UnitSystem } from "@/lib/units";

/** Props of {@link RouteViewPanel}. */
export interface RouteViewPanelProps {
  /** The route to show (from `buildRouteView`, SI units). */
  view: RouteView;
  /** The user's display units. */
  unitSystem: UnitSystem;
  /** How to colour map and profile; default by grade (a temperature colouring plugs in here later). */
  colouring?: RouteColouring;
  className?: string;
}

/** Map above profile, legend below; the linked hover state joins them. */
export function RouteViewPanel({ view, unitSystem, colouring = gradeColouring, className }: RouteViewPanelProps) {
  const [hoverDistanceM, setHoverDistanceM] = useState<number | null>(null);
  return (
    <Card className={cx("overflow-hidden", className)}>
      <div className="p-2 sm:p-3">
        <RouteMap
          view={view}
          unitSystem={unitSystem}
          colouring={colouring}
          hoverDistanceM={hoverDistanceM}
          onHoverDistance={setHoverDistanceM}
          className="h-[340px] sm:h-[460px]"
        />
      </div>
      <div className="border-t border-line px-3 pt-3 pb-2 sm:px-5">
        <ElevationProfile
          view={view}
          unitSystem={unitSystem}
          colouring={colouring}
          hoverDistanceM={hoverDistanceM}
          onHoverDistance={setHoverDistanceM}
        />
      </div>
      <GradeLegend colouring={colouring} unitSystem={unitSystem} className="border-t border-line px-3 py-3 sm:px-5" />
    </Card>
  );
}
