import { SaxesParser, type SaxesTagNS } from "saxes";
import { findEntityError } from "./find-entity-error";
import type { GpxLimits } from "./gpx-limits";
import { formatCount, type RouteProblem, routeError } from "./problems";

/** Receives the document's elements and text from {@link runSax}. May throw {@link GpxAbort}. */
export interface SaxSink {
  open(tag: SaxesTagNS, line: number): void;
  close(): void;
  text(text: string, line: number): void;
}

/** Thrown by a sink (or the runner) to stop parsing with one fatal problem. */
export class GpxAbort extends Error {
  constructor(readonly problem: RouteProblem) {
    super(problem.message);
  }
}

/** Input is fed to the parser in chunks of this size so that prolog and other limits act early. */
const CHUNK_CHARS = 65_536;

/**
 * Runs saxes 6 (a streaming, DOM-free XML 1.0 parser with namespace support) over `text` with the
 * hardening Fadeline needs (docs/security.md §C): any DOCTYPE is refused the moment it is seen, so no entity
 * is ever declared or expanded (XXE, billion laughs, quadratic blow-up: C1–C5); attribute counts are
 * capped while the tag is still being read (C7) and nesting depth as soon as a tag is complete, before any
 * of its content is read (C6); the prolog is capped. Any
 * well-formedness error (C11, C12) becomes one "not-xml" problem with its line and column, never a
 * partial result.
 *
 * @returns `null` on success, else the one fatal problem
 */
export function runSax(text: string, sink: SaxSink, limits: GpxLimits): RouteProblem | null {
  const parser = new SaxesParser({ xmlns: true, position: true });
  let depth = 0;
  let attributes = 0;
  let sawRoot = false;
  const openLines: number[] = []; // line of each open element, for messages about unclosed elements
  let lastClosedName = "";
  let lastClosedLine = 0;
  // Six handlers at most: saxes stores each one with a computed key, and V8 turns an object that gains too
  // many properties that way into a slow dictionary, which made every character read ~3× slower (a seventh
  // handler cost ~400 ms on a 100,000-point file). tests/unit/route/gpx-sax-speed.test.ts guards this.
  parser.on("doctype", () => abort(doctypeProblem(parser.line)));
  parser.on("attribute", () => {
    sawRoot = true; // attributes only occur in tags, and the first tag is the root
    attributes += 1;
    if (attributes > limits.maxAttributes) abort(tooManyAttributes(parser.line, limits.maxAttributes));
  });
  parser.on("opentag", (tag) => {
    sawRoot = true;
    attributes = 0; // counted afresh for the next tag
    depth += 1;
    if (depth > limits.maxDepth) abort(tooDeep(parser.line, parser.column, limits.maxDepth));
    if (!tag.isSelfClosing) openLines.push(parser.line);
    sink.open(tag, parser.line);
  });
  parser.on("closetag", (tag) => {
    depth -= 1;
    if (!tag.isSelfClosing) {
      lastClosedName = tag.name;
      lastClosedLine = openLines.pop() ?? 0;
    }
    sink.close();
  });
  parser.on("text", (t) => sink.text(t, parser.line));
  parser.on("cdata", (t) => sink.text(t, parser.line));
  try {
    for (let at = 0; at < text.length; at += CHUNK_CHARS) {
      parser.write(text.slice(at, at + CHUNK_CHARS));
      const written = Math.min(text.length, at + CHUNK_CHARS);
      if (!sawRoot && written > limits.maxPrologChars) abort(prologTooLong(limits.maxPrologChars));
    }
    parser.close();
    return null;
  } catch (err) {
    if (err instanceof GpxAbort) return err.problem;
    const raw = err instanceof Error ? err.message : String(err);
    return xmlErrorProblem(text, raw, lastClosedName === "" ? undefined : { name: lastClosedName, line: lastClosedLine });
  }
}

function abort(problem: RouteProblem): never {
  throw new GpxAbort(problem);
}

function doctypeProblem(line: number): RouteProblem {
  return routeError(
    "doctype",
    `Line ${line}: the file contains a DOCTYPE declaration. GPX files never need one, and Fadeline refuses ` +
      "them because they can carry entity tricks (external files, entity expansion). Export the file again " +
      "from your planner or device.",
    { line },
  );
}

function tooDeep(line: number, column: number, max: number): RouteProblem {
  return routeError(
    "too-deep",
    `Line ${line}: elements are nested more than ${max} levels deep. A GPX file needs fewer than ten; ` +
      "the file was refused.",
    { line, column },
  );
}

function tooManyAttributes(line: number, max: number): RouteProblem {
  return routeError(
    "too-many-attributes",
    `Line ${line}: an element has more than ${max} attributes. A GPX element needs a handful; the file was refused.`,
    { line },
  );
}

function prologTooLong(max: number): RouteProblem {
  return routeError(
    "prolog-too-long",
    `The file does not start its <gpx> element within the first ${formatCount(max)} characters, so it is ` +
      "not a GPX file Fadeline can read.",
  );
}

/** Turns a saxes message ("12:4: unclosed tag: trkpt") into a problem, preferring a precise & diagnosis. */
function xmlErrorProblem(text: string, raw: string, unclosed?: { name: string; line: number }): RouteProblem {
  const entity = findEntityError(text);
  if (entity !== null) return entityProblem(text, entity.index, entity.name);
  const m = /^(\d+):(\d+): (.*?)\.?$/s.exec(raw);
  const where = m === null ? undefined : { line: Number(m[1]), column: Number(m[2]) };
  let reason = m?.[3] ?? raw;
  // saxes reports a mismatched end tag after popping the element that should have been closed first.
  if (reason === "unexpected close tag" && unclosed !== undefined) {
    reason += `; <${unclosed.name}> opened on line ${unclosed.line} was never closed`;
  }
  const at = where === undefined ? "" : `line ${where.line}, column ${where.column}: `;
  if (/disallowed character/.test(reason)) {
    return routeError(
      "not-xml",
      `The file is not GPX text (${at}${reason}): it looks like a binary file, such as an image or an ` +
        "archive, or text in an encoding other than UTF-8. Upload the .gpx file itself.",
      where,
    );
  }
  return routeError(
    "not-xml",
    `The file is not well-formed XML (${at}${reason}). It may be damaged or cut short; export it again.`,
    where,
  );
}

function entityProblem(text: string, index: number, name: string | null): RouteProblem {
  const before = text.slice(0, index);
  const line = (before.match(/\n/g)?.length ?? 0) + 1;
  const column = index - (before.lastIndexOf("\n") + 1);
  const where = { line, column };
  if (name === null) {
    return routeError(
      "stray-ampersand",
      `Line ${line}, column ${column}: a bare "&" is not allowed in XML (it must be written "&amp;"). ` +
        "The file is not well-formed XML; export it again.",
      where,
    );
  }
  return routeError(
    "undefined-entity",
    `Line ${line}, column ${column}: the entity "&${name};" is not defined. Fadeline accepts only the XML ` +
      "built-in entities (&amp; &lt; &gt; &quot; &apos;) and numeric character references.",
    where,
  );
}
