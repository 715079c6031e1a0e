/** The badge image: a rounded rectangle by its signed distance function, so corners are transparent. */
import { describe, expect, it } from "vitest";
import { badgeImage } from "@/components/route-map/map-badges";

describe("badgeImage", () => {
  const { image, options } = badgeImage("#ffffff", "#16232a");
  const px = (x: number, y: number) => Array.from(image.data.slice((y * image.width + x) * 4, (y * image.width + x) * 4 + 4));

  it("is 32 × 32 RGBA at pixel ratio 2 with a stretchable middle and a content box inside the border", () => {
    expect([image.width, image.height, image.data.length]).toEqual([32, 32, 32 * 32 * 4]);
    expect(options.pixelRatio).toBe(2);
    expect(options.stretchX[0]![0]).toBeLessThan(options.stretchX[0]![1]);
    const [x1, y1, x2, y2] = options.content;
    expect(x1 > 0 && y1 > 0 && x2 < 32 && y2 < 32 && x1 < x2 && y1 < y2).toBe(true);
  });

  it("is transparent in the corners, border-coloured at the edge and filled in the middle", () => {
    expect(px(0, 0)[3]).toBe(0);
    expect(px(16, 1)).toEqual([0x16, 0x23, 0x2a, 255]);
    expect(px(16, 16)).toEqual([255, 255, 255, 255]);
  });

  it("rejects colours it cannot parse", () => {
    expect(() => badgeImage("red", "#000000")).toThrow(RangeError);
  });
});
