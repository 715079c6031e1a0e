import type { Page } from "@playwright/test";

/**
 * Counts the map canvas's pixels within ±tolerance (per RGB channel) of each colour: the canvas is drawn into
 * a 2D canvas (the map keeps its drawing buffer for this) and read back, so this checks what was painted,
 * not the DOM.
 */
export async function countMapPixels(page: Page, colours: string[], tolerance = 6): Promise<Record<string, number>> {
  return page.getByTestId("route-map").evaluate(
    (root, { colours, tolerance }) => {
      const canvas = root.querySelector("canvas");
      if (!canvas) return {};
      const copy = document.createElement("canvas");
      copy.width = canvas.width;
      copy.height = canvas.height;
      const ctx = copy.getContext("2d")!;
      ctx.drawImage(canvas, 0, 0);
      const data = ctx.getImageData(0, 0, copy.width, copy.height).data;
      const rgb = colours.map((c) => [parseInt(c.slice(1, 3), 16), parseInt(c.slice(3, 5), 16), parseInt(c.slice(5, 7), 16)]);
      const counts = Object.fromEntries(colours.map((c) => [c, 0]));
      for (let i = 0; i < data.length; i += 4) {
        rgb.forEach(([r, g, b], k) => {
          if (Math.abs(data[i]! - r!) <= tolerance && Math.abs(data[i + 1]! - g!) <= tolerance && Math.abs(data[i + 2]! - b!) <= tolerance) counts[colours[k]!]!++;
        });
      }
      return counts;
    },
    { colours, tolerance },
  );
}
