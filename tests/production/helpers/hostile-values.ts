// The hostile values themselves: numbers that are not numbers, text that is hard to store or show,
// bodies that are too big or too deep, files that lie about what they are.

/**
 * What people and scripts type into number fields. Every one must be refused by a number field.
 * (Not here: "0x1F", "0b11", "1e3", which JavaScript's Number() reads as 31, 3 and 1000; Conform
 * coerces form numbers with Number(), so the forms accept them as those values. Reported, not tested.)
 */
export const BAD_NUMBERS = [
  "",
  "NaN",
  "Infinity",
  "-Infinity",
  "1e309",
  "-1e309",
  "9".repeat(400),
  "1,5",
  "12abc",
  "１２", // full-width digits
  "null",
  "[]",
  "--1",
] as const;

/** Text that is awkward to store or render; NUL and lone surrogates cannot be stored as they are. */
export const ODD_TEXT = {
  nul: "Ridge\u0000hut",
  onlyNuls: "\u0000\u0000\u0000",
  loneSurrogate: "Ridge \uD800 hut",
  rtlOverride: "Hut \u202Egnp.exe\u202C",
  zeroWidth: "\u200B\u200C\u200D\uFEFF",
  emoji4Byte: "🔋⚡👩🏽‍🔧🏔️",
  sql: "'; DROP TABLE site; --",
  sqlUnion: "x' UNION SELECT password FROM account --",
  html: "<script>alert(1)</script>",
  attribute: '"><img src=x onerror=alert(1)>',
  percent: "%00%ZZ%",
  controlChars: "\u0001\u0007\u001b[31m\u007f",
} as const;

export const XSS_SCRIPT = "<script>alert(1)</script>";
export const XSS_ATTRIBUTE = '"><img src=x onerror=alert(1)>';

export const MEGABYTE = 1024 * 1024;

/** `size` bytes of one repeated character (a 10 MB text field, a 10 MB file). */
export function filler(size: number, char = "A") {
  return Buffer.alloc(size, char);
}

/** `[[[[…]]]]` or `{"a":{"a":…}}` nested `depth` levels deep. */
export function deepJson(depth: number, kind: "array" | "object" = "array") {
  return kind === "array" ? "[".repeat(depth) + "]".repeat(depth) : '{"a":'.repeat(depth) + "1" + "}".repeat(depth);
}

/** Bytes that are not UTF-8 at all: a CESU-8 lone surrogate (ED A0 80), a stray continuation byte, 0xFF. */
export const INVALID_UTF8 = Buffer.from([0x52, 0xed, 0xa0, 0x80, 0x80, 0xff, 0x68]);

/** A CSV cell quoted and never closed, quotes inside unquoted cells, a row of the wrong width. */
export function brokenCsv(header: string) {
  return `${header}\r\n"Unclosed,quote,row\r\nplain,"inner"quote",x\r\nonly-one-cell\r\n,,,,,,,,,,,,,,,,,,,,,,,,,,,,,,,,,,\r\n"a""b",c\r\n`;
}

/** Random-looking bytes with NULs: a binary file named .csv. */
export function binaryBytes(size = 4096) {
  const bytes = Buffer.alloc(size);
  let x = 0x2545f491;
  for (let i = 0; i < size; i++) {
    x ^= x << 13;
    x ^= x >>> 17;
    x ^= x << 5;
    bytes[i] = i % 7 === 0 ? 0 : x & 0xff;
  }
  return bytes;
}

/** The eight-byte PNG signature followed by garbage instead of an IHDR chunk. */
export function pngHeaderWithGarbage() {
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    Buffer.from("<html><script>alert(1)</script></html>"),
    binaryBytes(512),
  ]);
}

const UNRESERVED = new Uint8Array(256);
for (const c of "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-._~") UNRESERVED[c.charCodeAt(0)] = 1;
const HEX = "0123456789ABCDEF";

/** Percent-encodes every byte that is not unreserved, so any bytes (even invalid UTF-8) can be sent. */
export function percentEncode(value: string | Buffer): Buffer {
  const bytes = typeof value === "string" ? Buffer.from(value, "utf8") : value;
  const out = Buffer.alloc(bytes.length * 3);
  let at = 0;
  for (const b of bytes) {
    if (UNRESERVED[b]) out[at++] = b;
    else {
      out[at++] = 0x25;
      out[at++] = HEX.charCodeAt(b >> 4);
      out[at++] = HEX.charCodeAt(b & 15);
    }
  }
  return out.subarray(0, at);
}
