import "server-only";
import sharp from "sharp";
import type { AllowedMime } from "./sniff";

// Every stored photo is decoded and written out again, so nothing the camera or phone wrote
// beside the pixels (GPS position, device serial, time taken, thumbnails, comments) is kept.
// The EXIF orientation is applied to the pixels first, so a portrait photo stays upright
// once the tag that said "rotate me" is gone.

/** Larger than any phone camera's photo (a 48-megapixel sensor); refuses decompression bombs. */
const MAX_INPUT_PIXELS = 64_000_000;

export type Reencoded = { ok: true; bytes: Buffer; mimeType: AllowedMime } | { ok: false; message: string };

export async function reencodeImage(bytes: Buffer, mimeType: AllowedMime, name: string): Promise<Reencoded> {
  try {
    const image = sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS }).rotate();
    switch (mimeType) {
      case "image/jpeg":
        return { ok: true, bytes: await image.jpeg({ quality: 90 }).toBuffer(), mimeType };
      case "image/png":
        return { ok: true, bytes: await image.png().toBuffer(), mimeType };
      case "image/webp":
        return { ok: true, bytes: await image.webp({ quality: 90 }).toBuffer(), mimeType };
      case "image/heic":
        // Stored as JPEG when this machine's image library can read HEIC at all.
        return { ok: true, bytes: await image.jpeg({ quality: 90 }).toBuffer(), mimeType: "image/jpeg" };
      default:
        return { ok: true, bytes, mimeType };
    }
  } catch {
    if (mimeType === "image/heic") {
      return {
        ok: false,
        message: `"${name}" is a HEIC photo, which cannot be cleaned of its location data here; save or share it as a JPEG and upload that.`,
      };
    }
    return { ok: false, message: `"${name}" could not be read as an image (it may be damaged or too large, over 64 megapixels).` };
  }
}
