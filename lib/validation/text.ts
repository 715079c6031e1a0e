import { z } from "zod";

/** A trimmed, required single line of text (names): no line breaks, which could end up in mail headers. */
export function singleLine(label: { empty: string; max: number }) {
  return z
    .string({ error: label.empty })
    .trim()
    .min(1, label.empty)
    .max(label.max, `Use at most ${label.max} characters.`)
    .refine((s) => !/[\r\n\u0000]/.test(s), "A name cannot contain line breaks.");
}
