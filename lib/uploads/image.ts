/**
 * Image type and size from the bytes themselves (never the file name or the declared type):
 * PNG by its 8-byte signature and IHDR chunk (ISO/IEC 15948 / W3C PNG, clause 5.2 and
 * 11.2.2), JPEG by its SOI marker and the first start-of-frame segment (ITU-T T.81, B.2.2).
 */
export type ImageType = "image/png" | "image/jpeg";

export interface SniffedImage {
  contentType: ImageType;
  ext: "png" | "jpg";
  widthPx: number;
  heightPx: number;
}

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
/** Larger images than this are refused (a floor plan needs far less). */
export const MAX_IMAGE_SIDE_PX = 20_000;

function be16(b: Uint8Array, i: number): number {
  return (b[i]! << 8) | b[i + 1]!;
}

function be32(b: Uint8Array, i: number): number {
  return ((b[i]! << 24) >>> 0) + (b[i + 1]! << 16) + (b[i + 2]! << 8) + b[i + 3]!;
}

function sniffPng(b: Uint8Array): SniffedImage | null {
  if (b.length < 24 || !PNG_SIGNATURE.every((v, i) => b[i] === v)) return null;
  // The first chunk must be IHDR: length 13, type "IHDR", then width and height.
  if (be32(b, 8) !== 13 || String.fromCharCode(b[12]!, b[13]!, b[14]!, b[15]!) !== "IHDR") return null;
  return { contentType: "image/png", ext: "png", widthPx: be32(b, 16), heightPx: be32(b, 20) };
}

/** SOF0–SOF15 carry the frame size, except DHT (C4), JPG (C8) and DAC (CC). */
function isStartOfFrame(marker: number): boolean {
  return marker >= 0xc0 && marker <= 0xcf && marker !== 0xc4 && marker !== 0xc8 && marker !== 0xcc;
}

function sniffJpeg(b: Uint8Array): SniffedImage | null {
  if (b.length < 4 || b[0] !== 0xff || b[1] !== 0xd8 || b[2] !== 0xff) return null;
  let i = 2;
  while (i + 3 < b.length) {
    if (b[i] !== 0xff) return null;
    const marker = b[i + 1]!;
    if (marker === 0xff) {
      i += 1; // fill byte
      continue;
    }
    if (marker === 0x01 || (marker >= 0xd0 && marker <= 0xd8)) {
      i += 2; // markers without a length
      continue;
    }
    if (marker === 0xd9 || marker === 0xda) return null; // end of image / start of scan before any frame header
    const length = be16(b, i + 2);
    if (length < 2) return null;
    if (isStartOfFrame(marker)) {
      if (i + 8 >= b.length) return null;
      return { contentType: "image/jpeg", ext: "jpg", heightPx: be16(b, i + 5), widthPx: be16(b, i + 7) };
    }
    i += 2 + length;
  }
  return null;
}

/** The image's type and size, or null when the bytes are not a PNG or JPEG with a readable header. */
export function sniffImage(bytes: Uint8Array): SniffedImage | null {
  const image = sniffPng(bytes) ?? sniffJpeg(bytes);
  if (!image) return null;
  const ok = (n: number) => Number.isInteger(n) && n >= 1 && n <= MAX_IMAGE_SIDE_PX;
  return ok(image.widthPx) && ok(image.heightPx) ? image : null;
}
