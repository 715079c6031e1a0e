"use client";

import { useEffect, useState } from "react";
import { profileFromBytes } from "@/lib/route/profile-bytes";
import type { RouteProfile } from "@/lib/route";
import { prepareRoute, validateRouteProfile, type PreparedRoute } from "@/lib/thermal";

/** The plan route at full resolution, prepared for lib/thermal in the browser (fetched once, when asked for). */
export function useRouteModel(planId: string, wanted: boolean) {
  const [state, setState] = useState<{ status: "idle" | "loading" | "ready" | "error"; route?: PreparedRoute; profile?: RouteProfile; message?: string }>({ status: "idle" });
  useEffect(() => {
    if (!wanted || state.status !== "idle") return;
    setState({ status: "loading" });
    (async () => {
      const response = await fetch(`/api/plans/${planId}/route-profile`, { credentials: "same-origin" });
      if (!response.ok) throw new Error(`The route could not be loaded for the what-if (the server answered ${response.status}).`);
      const n = Number(response.headers.get("x-sample-count"));
      const step = Number(response.headers.get("x-step-m"));
      const profile = profileFromBytes(new Uint8Array(await response.arrayBuffer()), n, step);
      setState({ status: "ready", profile, route: prepareRoute(validateRouteProfile(profile)) });
    })().catch((error: unknown) => setState({ status: "error", message: error instanceof Error ? error.message : String(error) }));
  }, [planId, wanted, state.status]);
  return state;
}
