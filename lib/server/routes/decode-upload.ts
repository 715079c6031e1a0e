import "server-only";
import { AppError } from "@/lib/errors";

/** Uploads larger than this are refused before they are read in full (docs/security.md C8–C9). */
export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;

const SIGNATURES: { bytes: number[]; what: string }[] = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], what: "a ZIP archive (unzip it and upload the .gpx inside)" },
  { bytes: [0x1f, 0x8b], what: "a gzip-compressed file (decompress it first)" },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: "a PNG image" },
  { bytes: [0xff, 0xd8, 0xff], what: "a JPEG image" },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: "a PDF document" },
  { bytes: [0x47, 0x49, 0x46, 0x38], what: "a GIF image" },
];

const startsWith = (data: Uint8Array, bytes: number[]) => bytes.every((b, i) => data[i] === b);

/**
 * Turns uploaded bytes into text by their content, not their name (ASVS 5.2.2): UTF-8 with or without a
 * byte-order mark, or UTF-16 with one; known binary formats are named in the message.
 */
export function decodeUpload(data: Uint8Array): string {
  if (data.length === 0) throw new AppError("invalid_input", "The file is empty.");
  const binary = SIGNATURES.find((s) => startsWith(data, s.bytes));
  if (binary) throw new AppError("unsupported_media_type", `This file is ${binary.what}, not a GPX file.`);
  if (startsWith(data, [0xff, 0xfe])) return new TextDecoder("utf-16le").decode(data.subarray(2));
  if (startsWith(data, [0xfe, 0xff])) return new TextDecoder("utf-16be").decode(data.subarray(2));
  const sample = data.subarray(0, Math.min(data.length, 4096));
  if (sample.includes(0)) {
    throw new AppError("unsupported_media_type", "This file is not text (it looks like UTF-16 without a byte-order mark, or a binary file). Save the GPX as UTF-8.");
  }
  try {
    return new TextDecoder("utf-8", { fatal: true, ignoreBOM: false }).decode(data);
  } catch {
    throw new AppError("unsupported_media_type", "This file is not valid UTF-8 text. Save the GPX as UTF-8 and upload it again.");
  }
}

/** Reads a request body up to `max` bytes; a larger body (declared or not) is refused with 413 as soon as it is seen. */
export async function readUploadBody(request: Request, max = MAX_UPLOAD_BYTES): Promise<Uint8Array> {
  const tooLarge = () => new AppError("payload_too_large", `The file is larger than ${Math.round(max / 1024 / 1024)} MB.`);
  if (Number(request.headers.get("content-length") ?? 0) > max) throw tooLarge();
  if (!request.body) return new Uint8Array();
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > max) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}
