import type { SaxesTagNS } from "saxes";
import type { GpxLimits } from "./gpx-limits";
import { GpxAbort, type SaxSink } from "./gpx-sax";
import { plainText } from "./gpx-text";
import { openRootProblem, TimeNotes } from "./gpx-notes";
import type { GpxDocument, GpxPoint, GpxTrack } from "./gpx-types";
import { ProblemList } from "./problem-list";
import { formatCount, routeError } from "./problems";
import { type PendingPoint, type PointRules, readPoint } from "./read-point";

type Named = { name: string | null; description: string | null };
type Frame =
  | { kind: "gpx" | "metadata" | "ignore" }
  | { kind: "trk"; track: GpxTrack }
  | { kind: "rte"; track: GpxTrack; count: number }
  | { kind: "trkseg"; track: GpxTrack; points: GpxPoint[]; count: number }
  | { kind: "point"; pending: PendingPoint; into: GpxPoint[] | null }
  /** `ele` or `time` of the point in the frame below. */
  | { kind: "ele" | "time" }
  /** `name` or `desc` of a document, track, route or point. */
  | { kind: "text"; field: "name" | "desc"; owner: Named; whose: string; line: number };

// Frames without state are shared: a large file opens hundreds of thousands of elements.
const GPX: Frame = { kind: "gpx" };
const METADATA: Frame = { kind: "metadata" };
const IGNORE: Frame = { kind: "ignore" };
const ELE: Frame = { kind: "ele" };
const TIME: Frame = { kind: "time" };

/**
 * Turns the element and text events of {@link runSax} into a {@link GpxDocument}. Only elements in the
 * root's namespace are read, and only where GPX 1.0 / 1.1 puts them (gpx.xsd); everything else
 * (extensions, other namespaces, unknown GPX elements such as link, cmt, sym, type) is skipped with its
 * whole subtree. Structural limits throw {@link GpxAbort}; bad values are collected in `problems`.
 */
export class GpxBuilder implements SaxSink {
  readonly doc: GpxDocument = { version: null, name: null, description: null, tracks: [], routes: [], waypoints: [] };
  readonly problems: ProblemList;
  readonly notes = new TimeNotes();
  private readonly stack: Frame[] = [];
  /** Text of the open ele, time, name or desc (they have no children that are read, so never nest). */
  private collected = "";
  private ns = "";
  private points = 0;
  private segments = 0;
  private waypointCount = 0;

  constructor(
    private readonly limits: GpxLimits,
    private readonly rules: PointRules,
  ) {
    this.problems = new ProblemList(limits.maxProblems);
  }

  open(tag: SaxesTagNS, line: number): void {
    const parent = this.stack[this.stack.length - 1];
    if (parent === undefined) return this.openRoot(tag);
    const kind = parent.kind;
    const foreign = tag.uri !== this.ns || kind === "ignore" || kind === "ele" || kind === "time" || kind === "text";
    this.stack.push(foreign ? IGNORE : this.child(parent, tag, line));
  }

  text(text: string): void {
    const kind = this.stack[this.stack.length - 1]?.kind;
    if (kind === "ele" || kind === "time" || kind === "text") this.collected += text;
  }

  close(): void {
    const frame = this.stack.pop();
    if (frame === undefined) return;
    if (frame.kind === "ele" || frame.kind === "time") {
      const point = this.stack[this.stack.length - 1];
      if (point?.kind !== "point") return; // unreachable: ele and time are only opened in a point
      if (frame.kind === "ele") point.pending.eleText ??= this.collected;
      else point.pending.timeText ??= this.collected;
    } else if (frame.kind === "text") this.closeText(frame);
    else if (frame.kind === "point") this.closePoint(frame.pending, frame.into);
    else if (frame.kind === "trk" || frame.kind === "rte") this.notes.checkOrder(frame.track, this.problems);
  }

  private openRoot(tag: SaxesTagNS): void {
    const opened = openRootProblem(tag);
    if ("problem" in opened) throw new GpxAbort(opened.problem);
    this.ns = tag.uri;
    this.doc.version = opened.version;
    if (opened.warning !== undefined) this.problems.add(opened.warning);
    this.stack.push(GPX);
  }

  private child(parent: Frame, tag: SaxesTagNS, line: number): Frame {
    const local = tag.local;
    switch (parent.kind) {
      case "gpx":
        if (local === "trk") return { kind: "trk", track: this.newTrack("track") };
        if (local === "rte") return { kind: "rte", track: this.newTrack("route"), count: 0 };
        if (local === "wpt") return this.newPoint(tag, line, null, this.waypointCount++, "waypoint");
        if (local === "metadata") return METADATA;
        return this.textField(local, this.doc, "document", line);
      case "metadata":
        return this.textField(local, this.doc, "document", line);
      case "trk":
        if (local === "trkseg") return this.newSegment(parent.track);
        return this.textField(local, parent.track, "track", line);
      case "rte":
        if (local === "rtept") return this.newPoint(tag, line, parent, parent.count++, "route");
        return this.textField(local, parent.track, "route", line);
      case "trkseg":
        if (local === "trkpt") return this.newPoint(tag, line, parent, parent.count++, "track");
        return IGNORE;
      case "point":
        if (local === "ele" || local === "time") {
          this.collected = "";
          return local === "ele" ? ELE : TIME;
        }
        return this.textField(local, parent.pending, pointOwner(parent.pending), line);
      default:
        return IGNORE;
    }
  }

  /** name/desc of the document, a track, a route or a point. */
  private textField(local: string, owner: Named, whose: string, line: number): Frame {
    if (local !== "name" && local !== "desc") return IGNORE;
    this.collected = "";
    return { kind: "text", field: local, owner, whose, line };
  }

  private closeText(f: Extract<Frame, { kind: "text" }>): void {
    const isName = f.field === "name";
    const max = isName ? this.limits.maxNameChars : this.limits.maxDescriptionChars;
    const what = `${f.whose} ${isName ? "name" : "description"}`;
    const value = plainText(this.collected, what, max, isName, f.line);
    if (isName) f.owner.name ??= value;
    else f.owner.description ??= value;
  }

  private newTrack(kind: "track" | "route"): GpxTrack {
    const list = kind === "track" ? this.doc.tracks : this.doc.routes;
    if (this.doc.tracks.length + this.doc.routes.length >= this.limits.maxTracks) {
      throw new GpxAbort(
        routeError(
          "too-many-tracks",
          `The file has more than ${formatCount(this.limits.maxTracks)} tracks and routes; ` +
            "Fadeline accepts at most that many in one file.",
        ),
      );
    }
    const index = list.length;
    const track: GpxTrack = {
      id: `${kind}:${index}`,
      kind,
      index,
      name: null,
      description: null,
      segments: kind === "route" ? [[]] : [],
      timesOrdered: null,
    };
    list.push(track);
    return track;
  }

  private newSegment(track: GpxTrack): Frame {
    this.segments += 1;
    if (this.segments > this.limits.maxSegments) {
      throw new GpxAbort(
        routeError(
          "too-many-segments",
          `The file has more than ${formatCount(this.limits.maxSegments)} track segments; ` +
            "Fadeline accepts at most that many in one file.",
        ),
      );
    }
    const points: GpxPoint[] = [];
    track.segments.push(points);
    return { kind: "trkseg", track, points, count: 0 };
  }

  private newPoint(
    tag: SaxesTagNS,
    line: number,
    parent: Extract<Frame, { kind: "trkseg" | "rte" }> | null,
    pointIndex: number,
    kind: "track" | "route" | "waypoint",
  ): Frame {
    this.points += 1;
    if (this.points > this.limits.maxPoints) {
      const max = formatCount(this.limits.maxPoints);
      throw new GpxAbort(
        routeError(
          "too-many-points",
          `The file has more than ${max} points (tracks, routes and waypoints together); Fadeline accepts at ` +
            `most ${max}. Simplify the track in your planner or split it into several files.`,
        ),
      );
    }
    const pending = pendingPoint(tag, line, parent, pointIndex, kind);
    const into = parent === null ? null : parent.kind === "trkseg" ? parent.points : (parent.track.segments[0] ?? null);
    return { kind: "point", pending, into };
  }

  private closePoint(p: PendingPoint, into: GpxPoint[] | null): void {
    const point = readPoint(p, this.rules, this.problems, this.notes);
    if (point === null) return;
    if (into !== null) into.push(point);
    else this.doc.waypoints.push({ ...point, name: p.name, description: p.description });
  }
}

function pointOwner(p: PendingPoint): string {
  return p.kind === "waypoint" ? "waypoint" : `${p.kind} point`;
}

function pendingPoint(
  tag: SaxesTagNS,
  line: number,
  parent: Extract<Frame, { kind: "trkseg" | "rte" }> | null,
  point: number,
  kind: "track" | "route" | "waypoint",
): PendingPoint {
  const lat = tag.attributes.lat;
  const lon = tag.attributes.lon;
  return {
    // Only unprefixed attributes are GPX's (a prefixed o:lat belongs to another namespace).
    latText: lat !== undefined && lat.prefix === "" ? lat.value : undefined,
    lonText: lon !== undefined && lon.prefix === "" ? lon.value : undefined,
    eleText: undefined,
    timeText: undefined,
    name: null,
    description: null,
    line,
    kind,
    index: parent === null ? 0 : parent.track.index,
    segment: parent === null ? 0 : parent.track.segments.length - 1,
    point,
  };
}
