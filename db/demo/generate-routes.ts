/**
 * The demo routes: GPX 1.1 files recorded (in imagination) on the invented Tallow Island (./region.ts,
 * ./terrain.ts) by the invented operator Tallowmere Tag-Along Tours. Deterministic: a fixed seed per
 * route, so every run gives the same text. No real road, route or place.
 *
 * - "Tallowmere to Kestrel Gap": a valley road, switchbacks up to Harrier Saddle, a long 9 % descent of
 *   the Spinefell Range's east flank (the one that cooks brakes), then rolling country.
 * - "Cinder Flats loop": rolling country and the short, very steep pitch of Cinder Scarp (down, then up).
 * - "Marrow Creek track (two segments)": over Thistledown Saddle to Marrow Water, a ferry (the gap between
 *   the two track segments), and over a spur to Marrow Creek Camp, with a moderate descent in each part.
 */
import { recordDrive, type Fix } from "./gps-recorder";
import { type DemoWaypoint, formatGpx } from "./gpx-format";
import { between, mulberry32, type Rand } from "./prng";
import { lakeShoreDistanceM, place, toLonLat } from "./region";
import { RoadBuilder } from "./road-builder";
import { terrainGradient, terrainHeightM } from "./terrain";

/** One generated demo route. */
export interface DemoRoute {
  /** File and URL name, kebab-case (the CLI writes `<slug>.gpx`). */
  slug: string;
  name: string;
  description: string;
  /** The GPX 1.1 document. */
  gpx: string;
}

type Point = readonly [number, number];
const at = (name: string): Point => {
  const p = place(name);
  return [p.eastM, p.northM];
};

/** A waypoint at an invented place, elevation from the terrain. */
function waypoint(name: string, description: string, symbol: string): DemoWaypoint {
  const p = place(name);
  const [lon, lat] = toLonLat(p.eastM, p.northM);
  return { lon, lat, eleM: Math.round(terrainHeightM(p.eastM, p.northM) * 10) / 10, name, description, symbol, type: p.kind };
}

/** True once the ground is too gentle to hold `grade` below `belowM` metres. */
const flattensBelow = (grade: number, belowM: number) => (x: number, y: number) => {
  const [gx, gy] = terrainGradient(x, y);
  return Math.hypot(gx, gy) < grade && terrainHeightM(x, y) < belowM;
};

/** Where the ferry from Gullwater Landing lands on the north shore of Marrow Water, m. */
const NORTH_LANDING: Point = [-12260, 13720];

const START_MS = Date.UTC(2025, 2, 8, 20, 40, 0); // about 10:40 local solar time at 151° W

function tallowmereToKestrelGap(rand: Rand): { segments: Fix[][]; waypoints: DemoWaypoint[] } {
  const road = new RoadBuilder(at("Tallowmere"), 0.1);
  road.curveTo([at("Brindlecombe"), [-7200, 1900]], rand, 900, 200);
  road.traceGrade({
    grade: 0.09,
    target: at("Harrier Saddle"),
    switchbacks: { halfWidthM: 350, hairpinRadiusM: () => between(rand, 18, 26) },
    stopWithinM: 15,
  });
  road.traceGrade({ grade: -0.09, target: [3000, 4000], whenGentle: "fall-line", stopWhen: flattensBelow(0.085, 900) });
  road.curveTo([[8000, 9500], [14000, 10500], [19500, 8000], at("Kestrel Gap")], rand, 700, 220);
  return {
    segments: [recordDrive(road.east, road.north, rand)],
    waypoints: [
      waypoint("Greyvane Lookout", "Lookout at the crest of Harrier Saddle, before the long descent.", "Scenic Area"),
      waypoint("Fernhollow Camp", "Picnic area and camp part-way down the east side of Harrier Saddle.", "Picnic Area"),
    ],
  };
}

function cinderFlatsLoop(rand: Rand): { segments: Fix[][]; waypoints: DemoWaypoint[] } {
  const start = at("Cinder Flats");
  const road = new RoadBuilder(start, 0);
  const via: Point[] = [];
  for (let k = 1; k <= 11; k++) {
    const theta = -Math.PI / 2 + (2 * Math.PI * k) / 12;
    const r = between(rand, 4800, 5800);
    via.push([12000 + r * Math.cos(theta), -2500 + r * Math.sin(theta)]);
  }
  road.curveTo([...via, start], rand, 800, 200);
  return {
    segments: [recordDrive(road.east, road.north, rand)],
    waypoints: [
      waypoint("Cinder Flats", "Start and finish of the loop.", "Parking Area"),
      waypoint("Scarpend Lookout", "Lookout at the top of Cinder Scarp, just before the steep pitch down.", "Scenic Area"),
    ],
  };
}

function marrowCreekTrack(rand: Rand): { segments: Fix[][]; waypoints: DemoWaypoint[] } {
  const first = new RoadBuilder(at("Brindlecombe"), Math.PI / 2);
  first.curveTo([[-16400, 3200]], rand);
  first.traceGrade({
    grade: 0.07,
    target: at("Thistledown Saddle"),
    switchbacks: { halfWidthM: 700, hairpinRadiusM: () => between(rand, 25, 35) },
    stopWithinM: 15,
  });
  first.traceGrade({ grade: -0.06, target: at("Gullwater Landing"), stopWhen: (x, y) => lakeShoreDistanceM(x, y) < 160 });
  first.curveTo([at("Gullwater Landing")], rand, 500, 60);
  const one = recordDrive(first.east, first.north, rand);
  const ferryS = 35 * 60; // waiting for and crossing on the ferry
  const second = new RoadBuilder(NORTH_LANDING, Math.PI / 3);
  second.traceGrade({
    grade: 0.06,
    target: [-10900, 15300],
    switchbacks: { halfWidthM: 600, hairpinRadiusM: () => between(rand, 25, 35) },
    stopWhen: (x, y) => terrainHeightM(x, y) > 270,
  });
  second.traceGrade({ grade: -0.06, target: at("Marrow Creek Camp"), stopWhen: flattensBelow(0.055, 150) });
  second.curveTo([at("Marrow Creek Camp")], rand, 500, 60);
  const two = recordDrive(second.east, second.north, rand, (one[one.length - 1] as Fix).t + ferryS);
  return {
    segments: [one, two],
    waypoints: [
      waypoint("Thistledown Saddle", "Pass between Brindlecombe and Marrow Water.", "Summit"),
      waypoint("Gullwater Landing", "Ferry across Marrow Water; the recording pauses on the ferry.", "Anchor"),
      waypoint("Marrow Creek Camp", "Camp at the mouth of Marrow Creek.", "Campground"),
    ],
  };
}

const ROUTES = [
  {
    slug: "tallowmere-to-kestrel-gap",
    name: "Tallowmere to Kestrel Gap",
    description:
      "Valley road from Tallowmere, switchbacks up to Harrier Saddle, a long 9 % descent past Fernhollow Camp, then rolling country to Kestrel Gap.",
    seed: 3101,
    build: tallowmereToKestrelGap,
  },
  {
    slug: "cinder-flats-loop",
    name: "Cinder Flats loop",
    description: "Rolling loop from Cinder Flats with the short, very steep pitch of Cinder Scarp.",
    seed: 3102,
    build: cinderFlatsLoop,
  },
  {
    slug: "marrow-creek-track",
    name: "Marrow Creek track (two segments)",
    description:
      "Brindlecombe over Thistledown Saddle to Gullwater Landing, the ferry across Marrow Water (not recorded), then over the spur to Marrow Creek Camp.",
    seed: 3103,
    build: marrowCreekTrack,
  },
] as const;

/**
 * Generates the demo routes. Pure and deterministic: the same strings on every call and every run.
 * @returns the routes with their GPX 1.1 text
 */
export function demoRoutes(): DemoRoute[] {
  return ROUTES.map((r, i) => {
    const { segments, waypoints } = r.build(mulberry32(r.seed));
    const gpx = formatGpx({ name: r.name, description: r.description, startMs: START_MS + i * 86_400_000, waypoints, segments });
    return { slug: r.slug, name: r.name, description: r.description, gpx };
  });
}
