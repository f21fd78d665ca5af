// The pictures behind the history's photos: a few plain drawings of a bench, a tank, a gauge and a
// plug, made with sharp and stored the way an upload is (WebP and a thumbnail).
import { createHash } from "node:crypto";
import sharp from "sharp";
import { processImage } from "../../services/images.ts";
import type { Storage } from "../../storage/storage.ts";
import type { PhotoInfo } from "./history-rows.ts";

export interface GeneratedPhoto {
  info: PhotoInfo;
  main: Buffer;
  thumb: Buffer;
}

const W = 480;
const H = 360;

const scenes = [
  // A unit on the bench.
  `<rect width="${W}" height="${H}" fill="#5d6b72"/><rect y="250" width="${W}" height="110" fill="#8a6a48"/><rect x="120" y="120" width="220" height="130" rx="24" fill="#c0462d"/><circle cx="175" cy="265" r="38" fill="#222"/><circle cx="300" cy="265" r="38" fill="#222"/><rect x="300" y="60" width="14" height="90" fill="#333"/>`,
  // A fuel tank and its lines.
  `<rect width="${W}" height="${H}" fill="#3f4a4f"/><rect x="140" y="80" width="200" height="170" rx="30" fill="#d99a2b" opacity="0.85"/><rect x="140" y="170" width="200" height="80" rx="10" fill="#9c6a16"/><path d="M240 250 C240 310 330 300 360 330" stroke="#1c1c1c" stroke-width="10" fill="none"/>`,
  // A compression gauge.
  `<rect width="${W}" height="${H}" fill="#2e3a40"/><circle cx="240" cy="180" r="130" fill="#f2efe6" stroke="#1d1d1d" stroke-width="12"/><line x1="240" y1="180" x2="320" y2="110" stroke="#b3261e" stroke-width="8"/><circle cx="240" cy="180" r="14" fill="#1d1d1d"/>`,
  // A spark plug on a rag.
  `<rect width="${W}" height="${H}" fill="#6b5d52"/><rect x="60" y="200" width="360" height="120" fill="#d8d2c4"/><rect x="150" y="150" width="180" height="40" rx="16" fill="#f5f5f0"/><rect x="330" y="158" width="70" height="24" fill="#a8a8a8"/><rect x="110" y="162" width="40" height="16" fill="#7a7a7a"/>`,
];

export async function generatedPhotos(): Promise<GeneratedPhoto[]> {
  return Promise.all(
    scenes.map(async (body) => {
      const png = await sharp(Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}">${body}</svg>`)).png().toBuffer();
      const image = await processImage(png);
      return { main: image.main, thumb: image.thumb, info: { size: image.main.length, width: image.width, height: image.height, sha256: createHash("sha256").update(image.main).digest("hex") } };
    }),
  );
}

/** Writes each attachment's picture and thumbnail under its own keys, a few at a time. */
export async function writePhotos(storage: Storage, files: readonly { storageKey: string; thumbKey: string; image: number }[], photos: readonly GeneratedPhoto[]): Promise<void> {
  const at = 32;
  for (let i = 0; i < files.length; i += at) {
    await Promise.all(
      files.slice(i, i + at).flatMap((f) => [storage.put(f.storageKey, photos[f.image]!.main), storage.put(f.thumbKey, photos[f.image]!.thumb)]),
    );
  }
}
