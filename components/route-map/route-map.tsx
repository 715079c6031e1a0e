"use client";

/**
 * The route on our self-hosted basemap: coloured by a pluggable {@link RouteColouring} (grade by default),
 * descents highlighted, km or mi markers, start and end, a scale bar and attribution, fitted to the route.
 * Linked hover: `hoverDistanceM` puts a marker on the line; pointing at the line reports the distance there.
 *
 * MapLibre needs WebGL and `window`, so it is loaded with a dynamic import inside an effect: the server and
 * `next build`'s prerender only ever see the empty container. Once the route has been drawn the container
 * carries `data-map-state="idle"` (browser tests wait for it, then read the canvas, which keeps its pixels
 * thanks to `preserveDrawingBuffer`).
 */
import "maplibre-gl/dist/maplibre-gl.css";
import type { Map as MlMap, Marker, ScaleControl } from "maplibre-gl";
import { useEffect, useRef, useState } from "react";
import { Notice } from "@/components/ui/notice";
import { cx } from "@/components/ui/cx";
import { basemapStyle } from "@/lib/map/basemap-style";
import type { RouteView } from "@/lib/route";
import { formatDistance, type UnitSystem } from "@/lib/units";
import { nearestOnLine, positionAtDistance } from "./geometry";
import { gradeColouring, type RouteColouring } from "./grade-colours";
import { loadMapExtracts } from "./map-extracts";
import { addRoute, fitPadding, hoverMarkerElement, loadMapLib, readyLabelFont, updateRoute, WORLD_ARCHIVE_URL } from "./map-setup";

/** A point marked on the route line. */
export interface MapPin {
  /** Stable key. */
  id: string;
  /** Distance along the route, m. */
  distanceM: number;
  /** Short text on the pin, e.g. "Hottest 531 °C". */
  label: string;
  /** CSS colour of the pin. */
  colour: string;
}

/** @private The element of one pin: a rounded label with a pointer, in the pin's colour. */
function pinElement(pin: MapPin): HTMLElement {
  const el = document.createElement("div");
  el.className = "route-pin";
  el.dataset.testid = "map-pin";
  el.setAttribute("aria-label", pin.label);
  el.style.cssText = `background:${pin.colour};color:#fff;font:600 11px/1.2 system-ui,sans-serif;padding:2px 6px;border-radius:6px;border:1.5px solid #fff;box-shadow:0 1px 3px rgba(0,0,0,.35);white-space:nowrap;pointer-events:none`;
  el.textContent = pin.label;
  return el;
}

/** Props of {@link RouteMap}. */
export interface RouteMapProps {
  /** The route to draw (SI units). */
  view: RouteView;
  /** Units of the scale bar and the distance markers. */
  unitSystem: UnitSystem;
  /** Distance along the route to mark, m; null for no marker. */
  hoverDistanceM: number | null;
  /** Called with the distance of the route point under the pointer (within a few pixels), or null. */
  onHoverDistance?: (distanceM: number | null) => void;
  /** How to colour the line; default by grade. */
  colouring?: RouteColouring;
  /** Points to mark on the line (hottest points, advice points), each with a short label. */
  pins?: readonly MapPin[];
  /** Classes of the container (give it a height). */
  className?: string;
}

type MapState = "loading" | "idle" | "error";

/** How near the pointer must be to the drawn line to count as "on the route", CSS px (a finger needs more). */
const HIT_PX = { mouse: 14, touch: 28 };

/** Accessible name: what the map shows, in words. */
function mapLabel(view: RouteView, system: UnitSystem): string {
  const n = view.descents.length;
  return (
    `Map of the route, ${formatDistance(view.stats.lengthM, system)} long, coloured by grade, ` +
    `with ${n === 0 ? "no descents" : n === 1 ? "1 descent" : `${n} descents`} highlighted and distance markers. ` +
    "The elevation profile gives the same information as text."
  );
}

/** The route map. Renders a `data-testid="route-map"` container; give it a height through `className`. */
export function RouteMap({ view, unitSystem, hoverDistanceM, onHoverDistance, colouring = gradeColouring, pins, className }: RouteMapProps) {
  const hostRef = useRef<HTMLDivElement>(null);
  const mapRef = useRef<MlMap | null>(null);
  const markerRef = useRef<Marker | null>(null);
  const scaleRef = useRef<ScaleControl | null>(null);
  const [state, setState] = useState<MapState>("loading");
  const [ready, setReady] = useState(false);
  /** The view the map's sources currently hold (null until the first draw). */
  const drawn = useRef<RouteView | null>(null);
  // The map's handlers are bound once; they read the latest props through this ref.
  const latest = useRef({ view, unitSystem, colouring, onHoverDistance, hoverDistanceM });
  latest.current = { view, unitSystem, colouring, onHoverDistance, hoverDistanceM };

  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    let cancelled = false;
    let map: MlMap | null = null;
    let reported: number | null = null;
    const report = (d: number | null) => {
      if (d === reported) return;
      reported = d;
      latest.current.onHoverDistance?.(d);
    };
    (async () => {
      const [ml, extracts, font] = await Promise.all([loadMapLib(), loadMapExtracts(), readyLabelFont(host)]);
      if (cancelled) return;
      const { view: v, unitSystem: units } = latest.current;
      map = new ml.Map({
        container: host,
        style: basemapStyle(WORLD_ARCHIVE_URL, { fontFamily: font, extracts }),
        bounds: v.bounds,
        fitBoundsOptions: { padding: fitPadding(host), maxZoom: 15 },
        maxZoom: 17,
        attributionControl: false,
        canvasContextAttributes: { preserveDrawingBuffer: true },
        dragRotate: false,
        pitchWithRotate: false,
        touchPitch: false,
      });
      mapRef.current = map;
      map.touchZoomRotate.disableRotation();
      map.keyboard.disableRotation();
      map.addControl(new ml.NavigationControl({ showCompass: false }), "top-right");
      const scale = new ml.ScaleControl({ unit: units, maxWidth: 110 });
      scaleRef.current = scale;
      // On a phone the attribution spans the bottom edge, so the scale bar moves to the top.
      const narrow = host.clientWidth < 480;
      map.addControl(scale, narrow ? "top-left" : "bottom-left");
      // The world and extract sources carry their own credits; the control shows those in view.
      map.addControl(new ml.AttributionControl({ compact: narrow }), "bottom-right");
      markerRef.current = new ml.Marker({ element: hoverMarkerElement(), anchor: "center" });
      const m = map;
      m.on("load", () => {
        const now = latest.current;
        addRoute(m, now.view, now.colouring, now.unitSystem, font);
        m.once("idle", () => !cancelled && setState("idle"));
        setReady(true);
      });
      const hit = (point: { x: number; y: number }, lat: number, lon: number, radius: number) => {
        const near = nearestOnLine(latest.current.view.line, lat, lon);
        if (!near) return null;
        const p = m.project(near.position);
        return Math.hypot(p.x - point.x, p.y - point.y) <= radius ? near.distanceM : null;
      };
      m.on("mousemove", (e) => {
        const d = hit(e.point, e.lngLat.lat, e.lngLat.lng, HIT_PX.mouse);
        m.getCanvas().style.cursor = d === null ? "" : "crosshair";
        report(d);
      });
      m.on("mouseout", () => report(null));
      // A tap has no hover: tapping the line marks that point, tapping elsewhere clears it.
      m.on("touchend", (e) => {
        if (e.points.length <= 1) report(hit(e.point, e.lngLat.lat, e.lngLat.lng, HIT_PX.touch));
      });
    })().catch((error: unknown) => {
      if (cancelled) return;
      console.error("Route map could not start:", error);
      setState("error");
    });
    return () => {
      cancelled = true;
      markerRef.current?.remove();
      markerRef.current = null;
      scaleRef.current = null;
      mapRef.current = null;
      drawn.current = null;
      map?.remove();
      setReady(false);
    };
  }, []);

  // New route, colouring or units: replace the data (and refit for a new route) without rebuilding the map.
  useEffect(() => {
    const map = mapRef.current;
    if (!ready || !map) return;
    if (drawn.current === null) {
      drawn.current = view;
      return; // "load" just drew exactly these props
    }
    updateRoute(map, view, colouring, unitSystem);
    scaleRef.current?.setUnit(unitSystem);
    if (drawn.current !== view) map.fitBounds(view.bounds, { padding: fitPadding(map.getContainer()), maxZoom: 15, duration: 0 });
    drawn.current = view;
    setState("loading");
    map.once("idle", () => setState("idle"));
  }, [ready, view, colouring, unitSystem]);

  // Pins: HTML markers above the line, replaced whenever the list changes.
  const pinMarkers = useRef<Marker[]>([]);
  useEffect(() => {
    const map = mapRef.current;
    if (!ready || !map) return;
    let live = true;
    void loadMapLib().then((ml) => {
      if (!live) return;
      for (const m of pinMarkers.current) m.remove();
      pinMarkers.current = (pins ?? []).flatMap((pin) => {
        const at = positionAtDistance(view.line, pin.distanceM);
        return at ? [new ml.Marker({ element: pinElement(pin), anchor: "bottom", offset: [0, -6] }).setLngLat(at).addTo(map)] : [];
      });
    });
    return () => {
      live = false;
      for (const m of pinMarkers.current) m.remove();
      pinMarkers.current = [];
    };
  }, [ready, view, pins]);

  // The linked hover marker.
  useEffect(() => {
    const map = mapRef.current;
    const marker = markerRef.current;
    if (!ready || !map || !marker) return;
    const at = hoverDistanceM === null ? null : positionAtDistance(view.line, hoverDistanceM);
    if (at) marker.setLngLat(at).addTo(map);
    else marker.remove();
  }, [ready, view, hoverDistanceM]);

  return (
    <div
      data-testid="route-map"
      data-map-state={state}
      role="region"
      aria-label={mapLabel(view, unitSystem)}
      className={cx("relative isolate overflow-hidden rounded-lg border border-line bg-[#d3dde2]", className)}
    >
      {/* MapLibre gives its container `position: relative`, so size it by height, not by insets. */}
      <div ref={hostRef} className="h-full w-full" />
      {state === "error" && (
        <div className="absolute inset-0 grid place-items-center p-4">
          <Notice tone="caution" title="The map could not be shown">
            This browser could not start the map (it needs WebGL). The elevation profile and the descents still work.
          </Notice>
        </div>
      )}
    </div>
  );
}
