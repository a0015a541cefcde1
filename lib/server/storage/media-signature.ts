import "server-only";
import type { MediaType } from "@/lib/validation/form-checks";

/** How many leading bytes the checks below need. */
export const SIGNATURE_BYTES = 16;

const HEIF_BRANDS = new Set(["heic", "heix", "mif1"]);

function startsWith(bytes: Uint8Array, signature: number[], offset = 0): boolean {
  if (bytes.length < offset + signature.length) return false;
  return signature.every((value, index) => bytes[offset + index] === value);
}

function ascii(bytes: Uint8Array, from: number, to: number): string {
  return String.fromCharCode(...bytes.subarray(from, to));
}

/** ISO base media files (MP4, QuickTime, HEIF) open with a box whose type "ftyp" sits at offset 4. */
function ftypBrand(bytes: Uint8Array): string | null {
  if (bytes.length < 12 || ascii(bytes, 4, 8) !== "ftyp") return null;
  return ascii(bytes, 8, 12);
}

/**
 * Whether the leading bytes match the declared type (file signatures: ISO/IEC 14496-12 `ftyp` box,
 * EBML header 1A 45 DF A3 for WebM, JPEG SOI FF D8 FF, PNG 89 50 4E 47). A HEIF still declared as a
 * video is refused: its brand says it is an image.
 */
export function matchesDeclaredType(type: MediaType, bytes: Uint8Array): boolean {
  switch (type) {
    case "video/mp4":
    case "video/quicktime": {
      const brand = ftypBrand(bytes);
      return brand !== null && !HEIF_BRANDS.has(brand);
    }
    case "image/heic": {
      const brand = ftypBrand(bytes);
      return brand !== null && HEIF_BRANDS.has(brand);
    }
    case "video/webm":
      return startsWith(bytes, [0x1a, 0x45, 0xdf, 0xa3]);
    case "image/jpeg":
      return startsWith(bytes, [0xff, 0xd8, 0xff]);
    case "image/png":
      return startsWith(bytes, [0x89, 0x50, 0x4e, 0x47]);
  }
}

/** File extension of the final key, from the checked type (never from the uploaded file name). */
export function extensionOf(type: MediaType): string {
  const map: Record<MediaType, string> = {
    "video/mp4": "mp4",
    "video/quicktime": "mov",
    "video/webm": "webm",
    "image/jpeg": "jpg",
    "image/png": "png",
    "image/heic": "heic",
  };
  return map[type];
}
