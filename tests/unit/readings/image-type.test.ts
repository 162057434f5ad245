// Photo types from content. Signatures: JPEG SOI marker FF D8 then a marker FF (ITU-T T.81,
// Annex B); PNG signature 89 50 4E 47 0D 0A 1A 0A then the IHDR chunk first, length 13, width and
// height at least 1 (PNG specification, §5.2, §5.6, §11.2.2); WebP "RIFF" size "WEBP" (WebP
// container specification).
import { describe, expect, it } from "vitest";
import { detectPhotoType } from "~/lib/image-type";

const bytes = (...values: number[]) => new Uint8Array(values);
const ascii = (text: string) => [...text].map((c) => c.charCodeAt(0));

describe("detectPhotoType", () => {
  it("knows JPEG, PNG and WebP by their first bytes", () => {
    expect(detectPhotoType(bytes(0xff, 0xd8, 0xff, 0xe0, 0, 0x10))).toBe("image/jpeg");
    expect(detectPhotoType(bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, ...ascii("IHDR"), 0, 0, 1, 0x68, 0, 0, 0, 0xf0))).toBe(
      "image/png",
    );
    expect(detectPhotoType(bytes(...ascii("RIFF"), 0x24, 0, 0, 0, ...ascii("WEBPVP8 ")))).toBe("image/webp");
  });

  it("refuses text, other RIFF files, truncated signatures and empty files", () => {
    expect(detectPhotoType(new TextEncoder().encode("voltage,current\n1,2\n"))).toBeNull();
    expect(detectPhotoType(new TextEncoder().encode("<svg xmlns='http://www.w3.org/2000/svg'/>"))).toBeNull();
    expect(detectPhotoType(bytes(...ascii("RIFF"), 0x24, 0, 0, 0, ...ascii("WAVE")))).toBeNull();
    expect(detectPhotoType(bytes(0x89, 0x50, 0x4e, 0x47))).toBeNull();
    // A PNG signature glued to other content, and a header claiming a picture 0 pixels wide.
    expect(detectPhotoType(bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, ...ascii("<html><script>")))).toBeNull();
    expect(detectPhotoType(bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, ...ascii("IHDR"), 0, 0, 0, 0, 0, 0, 0, 0xf0))).toBeNull();
    expect(detectPhotoType(bytes(0xff, 0xd8))).toBeNull();
    expect(detectPhotoType(bytes())).toBeNull();
  });
});
