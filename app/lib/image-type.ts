// An evidence photo's type, read from its first bytes rather than from its name or the browser's
// claim, so a renamed text file or script is refused. Signatures from the formats' specifications:
// JPEG starts with the SOI marker FF D8 followed by another marker's FF (ITU-T T.81, Annex B);
// PNG with its eight-byte signature 89 50 4E 47 0D 0A 1A 0A (PNG spec, §5.2) and then its IHDR
// chunk, which must come first, 13 bytes long, with a width and height of at least 1 (§5.6, §11.2.2),
// so a signature glued to other content is refused; WebP is a RIFF container: "RIFF", a 4-byte size,
// then "WEBP" (WebP container specification).
export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;

export type PhotoType = "image/jpeg" | "image/png" | "image/webp";

export const PHOTO_EXTENSION: Record<PhotoType, string> = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/webp": "webp",
};

function startsWith(bytes: Uint8Array, signature: readonly number[], offset = 0): boolean {
  if (bytes.length < offset + signature.length) return false;
  return signature.every((b, i) => bytes[offset + i] === b);
}

const ascii = (text: string) => [...text].map((c) => c.charCodeAt(0));

export function detectPhotoType(bytes: Uint8Array): PhotoType | null {
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return "image/jpeg";
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return hasPngHeader(bytes) ? "image/png" : null;
  if (startsWith(bytes, ascii("RIFF")) && startsWith(bytes, ascii("WEBP"), 8)) return "image/webp";
  return null;
}

function hasPngHeader(bytes: Uint8Array): boolean {
  if (!startsWith(bytes, [0, 0, 0, 13, ...ascii("IHDR")], 8) || bytes.length < 24) return false;
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  return view.getUint32(16) > 0 && view.getUint32(20) > 0;
}
