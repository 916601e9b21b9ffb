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
  /** The photo to keep: the upload itself, or, when it carried EXIF, XMP or IPTC data, a re-encoded copy without it. */
  original: Uint8Array;
}

/**
 * Decodes a photo (already sniffed as JPEG, PNG or WebP): its displayed size, after the EXIF
 * orientation, a 320 px wide WebP thumbnail, and the original to keep. Phones write the place a
 * photo was taken (and the device) into its metadata; a shop's photos of a customer's unit must not
 * carry the customer's whereabouts, so such a photo is kept re-encoded, turned upright, without it.
 * A file sharp cannot decode is refused (415).
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
    const original = meta.exif || meta.xmp || meta.iptc ? await withoutMetadata(bytes, meta.format) : bytes;
    return { width: swapped ? meta.height : meta.width, height: swapped ? meta.width : meta.height, thumbnail, original };
  } catch {
    throw new AppError("unsupported", "That photo could not be read; it may be damaged. Try exporting it again as JPEG or PNG.");
  }
}

/** Re-encodes in the same format; sharp writes no metadata unless asked to. */
async function withoutMetadata(bytes: Uint8Array, format: string | undefined): Promise<Buffer> {
  const upright = sharp(bytes, { limitInputPixels: MAX_PIXELS }).rotate();
  if (format === "jpeg") return upright.jpeg({ quality: 92, mozjpeg: true }).toBuffer();
  if (format === "webp") return upright.webp({ quality: 90 }).toBuffer();
  return upright.png().toBuffer();
}

/** Rasterises trusted SVG artwork (the demo content's drawings) to PNG; SVG itself is never served. */
export async function rasteriseSvg(svg: Uint8Array, density = 144): Promise<Buffer> {
  return sharp(svg, { density }).png({ compressionLevel: 9 }).toBuffer();
}
