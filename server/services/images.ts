// Uploaded photos: trust the bytes, not the name or declared type, and keep only a fresh re-encoding.
import sharp from "sharp";
import { HttpError } from "../lib/errors.ts";

export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;
/** A pixel-flood guard: a 40 MP photo is bigger than any tablet camera's. */
export const MAX_INPUT_PIXELS = 40_000_000;
export const MAX_SIDE = 2048;
export const THUMB_SIDE = 320;

export type ImageKind = "jpeg" | "png" | "webp" | "heic";

export function sniffImage(bytes: Buffer): ImageKind | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return "jpeg";
  if (bytes.length >= 4 && bytes.subarray(0, 4).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47]))) return "png";
  if (bytes.length >= 12 && bytes.toString("latin1", 0, 4) === "RIFF" && bytes.toString("latin1", 8, 12) === "WEBP") return "webp";
  if (bytes.length >= 12 && bytes.toString("latin1", 4, 8) === "ftyp" && ["heic", "heix", "mif1", "msf1"].includes(bytes.toString("latin1", 8, 12))) return "heic";
  return null;
}

export const unsupportedMedia = (message = "Send a photo as JPEG, PNG, WebP or HEIC.") => new HttpError(415, "unsupported_media_type", message);

export interface ProcessedImage {
  main: Buffer;
  thumb: Buffer;
  width: number;
  height: number;
  mimeType: "image/webp";
}

/** Re-encodes to WebP, upright, at most 2048 px a side, with every metadata block (EXIF, GPS) dropped, plus a thumbnail. */
export async function processImage(bytes: Buffer): Promise<ProcessedImage> {
  if (!sniffImage(bytes)) throw unsupportedMedia();
  try {
    // No withMetadata(): sharp writes none of the input's EXIF, GPS or XMP into the output.
    const main = await sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS, failOn: "error" })
      .rotate()
      .resize({ width: MAX_SIDE, height: MAX_SIDE, fit: "inside", withoutEnlargement: true })
      .webp({ quality: 82 })
      .toBuffer({ resolveWithObject: true });
    const thumb = await sharp(main.data).resize({ width: THUMB_SIDE, height: THUMB_SIDE, fit: "inside", withoutEnlargement: true }).webp({ quality: 75 }).toBuffer();
    return { main: main.data, thumb, width: main.info.width, height: main.info.height, mimeType: "image/webp" };
  } catch (e) {
    const message = e instanceof Error ? e.message : String(e);
    if (/pixel limit/i.test(message)) throw unsupportedMedia(`The photo has more than ${MAX_INPUT_PIXELS / 1_000_000} million pixels; send a smaller one.`);
    throw unsupportedMedia("The file looks like an image but cannot be read as one.");
  }
}
