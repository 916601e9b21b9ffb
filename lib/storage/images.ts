import sharp from "sharp";
import { AppError } from "@/lib/errors";

export const THUMB_WIDTH = 320;
export const THUMB_MIME = "image/webp";
// Refuse decompression bombs: no photo of the trade needs more than 100 megapixels.
const MAX_PIXELS = 100_000_000;

export interface PhotoFacts {
  width: number;
  height: number;
  thumbnail: Buffer;
}

/**
 * Decodes a photo (already sniffed as JPEG, PNG or WebP): its displayed size, after the EXIF
 * orientation, and a 320 px wide WebP thumbnail. A file sharp cannot decode is refused (415).
 */
export async function examinePhoto(bytes: Uint8Array): Promise<PhotoFacts> {
  try {
    const image = sharp(bytes, { limitInputPixels: MAX_PIXELS, failOn: "error" });
    const meta = await image.metadata();
    if (!meta.width || !meta.height) throw new Error("no dimensions");
    const swapped = (meta.orientation ?? 1) >= 5;
    const thumbnail = await sharp(bytes, { limitInputPixels: MAX_PIXELS })
      .rotate()
      .resize({ width: THUMB_WIDTH, withoutEnlargement: true })
      .webp({ quality: 78 })
      .toBuffer();
    return { width: swapped ? meta.height : meta.width, height: swapped ? meta.width : meta.height, thumbnail };
  } catch {
    throw new AppError("unsupported", "That photo could not be read; it may be damaged. Try exporting it again as JPEG or PNG.");
  }
}

/** Rasterises trusted SVG artwork (the demo content's drawings) to PNG; SVG itself is never served. */
export async function rasteriseSvg(svg: Uint8Array, density = 144): Promise<Buffer> {
  return sharp(svg, { density }).png({ compressionLevel: 9 }).toBuffer();
}
