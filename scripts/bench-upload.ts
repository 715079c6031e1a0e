/**
 * Upload benchmark: a 100,000-point GPX (≈ 9 MB) parsed and processed on the server through the upload
 * path (processUpload: the compiled worker thread with its memory and time limits), goal ≤ 1.5 s and
 * ≤ 300 MB extra memory; gpxparser's DOM path on the same file for comparison (goal: ours ≥ 10× faster);
 * and the size of the route page's data (goal ≤ 2 MB). Prints figures, asserts nothing.
 * Run: npm run bench (or node --conditions=react-server --import tsx scripts/bench-upload.ts).
 */
import { gaussian, mulberry32, pathPoints, rollingRoad, toGpx } from "../tests/unit/route/synthetic";
import { processUpload } from "../lib/server/routes/process-upload";

function road(points: number, spacingM: number) {
  const xy = Array.from({ length: points }, (_, i) => {
    const s = i * spacingM;
    return [s, 400 * Math.sin(s / 2500) + 60 * Math.sin(s / 300)] as [number, number];
  });
  const noise = gaussian(mulberry32(7));
  return pathPoints(xy, (d) => rollingRoad(d) + 2 * noise());
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

async function main() {
  const text = toGpx([road(100_000, 15)], "Benchmark road");
  console.log(`file: 100,000 points, ${(text.length / 1e6).toFixed(1)} MB`);
  const ours: number[] = [];
  let peakExtraMb = 0;
  let viewBytes = 0;
  for (let run = 0; run < 6; run++) {
    const base = process.memoryUsage().rss;
    let peak = base;
    const sampler = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 5);
    const started = performance.now();
    const result = await processUpload(text);
    const ms = performance.now() - started;
    clearInterval(sampler);
    if (!result.ok) throw new Error(result.problems[0]?.message);
    viewBytes = JSON.stringify(result.view).length;
    if (run > 0) ours.push(ms); // the first run warms the disk cache and the JIT
    peakExtraMb = Math.max(peakExtraMb, (peak - base) / 1e6);
  }
  const { default: GpxParser } = await import("gpxparser");
  const theirs: number[] = [];
  for (let run = 0; run < 3; run++) {
    const started = performance.now();
    new GpxParser().parse(text);
    theirs.push(performance.now() - started);
  }
  const a = median(ours);
  const b = median(theirs);
  console.log(`server upload path (worker): median ${a.toFixed(0)} ms of ${ours.length} runs (goal ≤ 1500 ms); peak extra RSS ${peakExtraMb.toFixed(0)} MB (goal ≤ 300 MB)`);
  console.log(`gpxparser 3.0.8 DOM parse:   median ${b.toFixed(0)} ms of ${theirs.length} runs; ours is ${(b / a).toFixed(1)}× faster (goal ≥ 10×)`);
  console.log(`route page data (RouteView): ${(viewBytes / 1e6).toFixed(2)} MB of JSON (goal ≤ 2 MB)`);
  process.exit(0);
}

void main();
