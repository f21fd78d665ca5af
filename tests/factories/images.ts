import sharp from "sharp";

/** A small real image made on the spot, optionally carrying EXIF so a test can check it is stripped. */
export async function makeImage(format: "png" | "jpeg" = "png", options: { width?: number; height?: number; exif?: boolean } = {}): Promise<Buffer> {
  const { width = 64, height = 48, exif = false } = options;
  let image = sharp({ create: { width, height, channels: 3, background: { r: 200, g: 90, b: 30 } } });
  if (exif) image = image.withMetadata({ exif: { IFD0: { Copyright: "Bench test", Artist: "Test camera" } } });
  return format === "png" ? image.png().toBuffer() : image.jpeg().toBuffer();
}
