/**
 * Rounded "badge" images for the km markers and descent numbers, drawn pixel by pixel so the map needs no
 * sprite download and no canvas. Pure: the result goes to `map.addImage(id, image, options)`, and MapLibre
 * stretches the middle of the badge around the text (`icon-text-fit`), keeping the rounded corners.
 */

/** Raw RGBA pixels, not premultiplied (as `ImageData`). */
export interface BadgeImage {
  width: number;
  height: number;
  data: Uint8ClampedArray;
}

/** `map.addImage` options of a badge: resolution and the stretchable and content areas, image pixels. */
export interface BadgeImageOptions {
  pixelRatio: number;
  stretchX: [number, number][];
  stretchY: [number, number][];
  content: [number, number, number, number];
}

const SIZE = 32; // image pixels; at pixelRatio 2 the unstretched badge is 16 CSS px
const RADIUS = 10;
const BORDER = 3;

function rgb(hex: string): [number, number, number] {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new RangeError(`expected a #rrggbb colour, got ${hex}`);
  return [parseInt(m[1]!, 16), parseInt(m[2]!, 16), parseInt(m[3]!, 16)];
}

/**
 * Signed distance from a point to a rounded rectangle centred at the origin, negative inside (the standard
 * box SDF with rounded corners; Quílez, "2D distance functions", iquilezles.org).
 */
function roundedBoxDistance(x: number, y: number, half: number, r: number): number {
  const qx = Math.abs(x) - (half - r);
  const qy = Math.abs(y) - (half - r);
  return Math.hypot(Math.max(qx, 0), Math.max(qy, 0)) + Math.min(Math.max(qx, qy), 0) - r;
}

/**
 * A rounded badge with a border, anti-aliased by pixel coverage.
 * @param fill inside colour, #rrggbb
 * @param stroke border colour, #rrggbb
 */
export function badgeImage(fill: string, stroke: string): { image: BadgeImage; options: BadgeImageOptions } {
  const f = rgb(fill);
  const s = rgb(stroke);
  const data = new Uint8ClampedArray(SIZE * SIZE * 4);
  const half = SIZE / 2;
  for (let y = 0; y < SIZE; y++) {
    for (let x = 0; x < SIZE; x++) {
      const d = roundedBoxDistance(x + 0.5 - half, y + 0.5 - half, half - 0.5, RADIUS);
      const outer = Math.min(1, Math.max(0, 0.5 - d));
      const inner = Math.min(1, Math.max(0, 0.5 - (d + BORDER)));
      const k = (y * SIZE + x) * 4;
      for (let c = 0; c < 3; c++) data[k + c] = Math.round(s[c]! + (f[c]! - s[c]!) * inner);
      data[k + 3] = Math.round(255 * outer);
    }
  }
  return {
    image: { width: SIZE, height: SIZE, data },
    options: {
      pixelRatio: 2,
      stretchX: [[RADIUS, SIZE - RADIUS]],
      stretchY: [[RADIUS, SIZE - RADIUS]],
      content: [BORDER + 3, BORDER + 2, SIZE - BORDER - 3, SIZE - BORDER - 2],
    },
  };
}
