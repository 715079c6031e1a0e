import type { SaxesTagNS } from "saxes";
import { GPX_1_0_NS, GPX_1_1_NS, type GpxTrack } from "./gpx-types";
import type { ProblemList } from "./problem-list";
import { formatCount, type ProblemLocation, type RouteProblem, routeError, routeWarning } from "./problems";
import { type PendingPoint, pointLabel, pointWhere } from "./read-point";

/** Result of checking the root element. */
export type RootCheck = { version: "1.0" | "1.1" | null; warning?: RouteProblem } | { problem: RouteProblem };

/**
 * Checks the root element: its local name must be `gpx` (docs/security.md C13: HTML, KML and other XML are
 * refused), in the GPX 1.0 or 1.1 namespace. A `gpx` root with no namespace at all is accepted and read
 * as GPX 1.1, with a warning: such files come from old or hand-written tools and are otherwise
 * unambiguous. Any other namespace is refused.
 */
export function openRootProblem(tag: SaxesTagNS): RootCheck {
  const shown = tag.name.length > 40 ? `${tag.name.slice(0, 40)}…` : tag.name;
  if (tag.local !== "gpx") {
    return {
      problem: routeError(
        "not-gpx",
        `The file is XML but not GPX: its root element is <${shown}>, and a GPX file starts with <gpx>.`,
      ),
    };
  }
  if (tag.uri === GPX_1_1_NS) return { version: "1.1" };
  if (tag.uri === GPX_1_0_NS) return { version: "1.0" };
  if (tag.uri === "") {
    return {
      version: null,
      warning: routeWarning(
        "no-namespace",
        `The <gpx> element declares no namespace; it was read as GPX 1.1 (${GPX_1_1_NS}).`,
      ),
    };
  }
  const ns = tag.uri.length > 80 ? `${tag.uri.slice(0, 80)}…` : tag.uri;
  return {
    problem: routeError(
      "wrong-namespace",
      `The <gpx> element is in the namespace "${ns}", which is neither GPX 1.0 (${GPX_1_0_NS}) ` +
        `nor GPX 1.1 (${GPX_1_1_NS}).`,
    ),
  };
}

/**
 * Collects time issues. Times are optional and never make a file fail: unreadable ones are dropped
 * (`timeS: null`), zone-less ones are read as UTC, and backwards ones are kept but flagged, each reported
 * once per file (or once per track) rather than once per point.
 */
export class TimeNotes {
  private invalid = 0;
  private noZone = 0;
  private firstInvalid: PendingPoint | null = null;
  private firstNoZone: PendingPoint | null = null;

  noteTime(issue: "invalid" | "no-zone" | null, p: PendingPoint): void {
    if (issue === "invalid") {
      this.invalid += 1;
      this.firstInvalid ??= p;
    } else if (issue === "no-zone") {
      this.noZone += 1;
      this.firstNoZone ??= p;
    }
  }

  /** Sets `track.timesOrdered` and reports the first backwards step. */
  checkOrder(track: GpxTrack, problems: ProblemList): void {
    let last = -Infinity;
    let timed = false;
    for (let s = 0; s < track.segments.length; s++) {
      const seg = track.segments[s] ?? [];
      for (let i = 0; i < seg.length; i++) {
        const t = seg[i]?.timeS;
        if (t === null || t === undefined) continue;
        timed = true;
        if (t < last) {
          track.timesOrdered = false;
          problems.add(backwards(track, s, i, seg[i]?.line ?? 0));
          return;
        }
        last = t;
      }
    }
    track.timesOrdered = timed ? true : null;
  }

  /** Adds the per-file summaries. */
  finish(problems: ProblemList): void {
    if (this.firstInvalid !== null) {
      problems.add(
        routeWarning(
          "invalid-time",
          `${formatCount(this.invalid)} point time(s) could not be read (first: ${pointLabel(this.firstInvalid)}); ` +
            "those times are ignored.",
          pointWhere(this.firstInvalid),
        ),
      );
    }
    if (this.firstNoZone !== null) {
      problems.add(
        routeWarning(
          "time-without-zone",
          `${formatCount(this.noZone)} point time(s) have no time zone (first: ${pointLabel(this.firstNoZone)}); ` +
            "they were read as UTC.",
          pointWhere(this.firstNoZone),
        ),
      );
    }
  }
}

function backwards(track: GpxTrack, segment: number, point: number, line: number): RouteProblem {
  const where: ProblemLocation = { line, kind: track.kind, index: track.index, segment, point };
  const name = track.kind === "track" ? "Track" : "Route";
  const at = track.kind === "track" ? `segment ${segment + 1}, point ${point + 1}` : `point ${point + 1}`;
  return routeWarning(
    "times-out-of-order",
    `${name} ${track.index + 1}: times go backwards at ${at} (line ${line}). The times are kept for ` +
      "reference but Fadeline does not rely on them.",
    where,
  );
}
