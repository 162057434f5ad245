// Draws a small PNG "evidence photo" for the demo and the tests: a sky, a module with its cell grid
// and label, and a meter box. Invented pictures, generated here so that no real photo is shipped.
// PNG encoding per the PNG specification: signature, IHDR, one zlib IDAT of filter-0 scanlines, IEND.
import { crc32, deflateSync } from "node:zlib";

function chunk(type: string, data: Buffer) {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body) >>> 0);
  return Buffer.concat([length, body, crc]);
}

export function encodePng(width: number, height: number, pixel: (x: number, y: number) => [number, number, number]): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 2; // colour type: truecolour RGB
  const raw = Buffer.alloc(height * (1 + width * 3));
  for (let y = 0; y < height; y++) {
    const row = y * (1 + width * 3);
    raw[row] = 0; // filter: none
    for (let x = 0; x < width; x++) {
      const [r, g, b] = pixel(x, y);
      raw[row + 1 + x * 3] = r;
      raw[row + 2 + x * 3] = g;
      raw[row + 3 + x * 3] = b;
    }
  }
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk("IHDR", header),
    chunk("IDAT", deflateSync(raw)),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}

/** A module in the sun; `variant` shifts the sky and the module's size so photos differ. */
export function demoModulePhoto(variant = 0, width = 360, height = 240): Buffer {
  const skyTop: [number, number, number] = [120 + ((variant * 17) % 40), 170, 225];
  const left = 40 + ((variant * 13) % 30);
  const top = 40;
  const moduleW = 200 - ((variant * 7) % 40);
  const moduleH = 140;
  const cellsX = 6;
  const cellsY = 4;
  return encodePng(width, height, (x, y) => {
    const inModule = x >= left && x < left + moduleW && y >= top && y < top + moduleH;
    if (inModule) {
      const frame = x < left + 4 || x >= left + moduleW - 4 || y < top + 4 || y >= top + moduleH - 4;
      if (frame) return [190, 195, 200];
      const cx = ((x - left - 4) * cellsX) / (moduleW - 8);
      const cy = ((y - top - 4) * cellsY) / (moduleH - 8);
      if (cx % 1 < 0.04 || cy % 1 < 0.05) return [220, 225, 235];
      const label = x > left + moduleW - 60 && x < left + moduleW - 14 && y > top + moduleH - 34 && y < top + moduleH - 12;
      return label ? [245, 240, 225] : [28, 40, 78 + ((x + y) % 9)];
    }
    const meter = x > width - 90 && x < width - 20 && y > height - 80 && y < height - 20;
    if (meter) return x > width - 80 && x < width - 30 && y > height - 70 && y < height - 50 ? [150, 210, 150] : [200, 120, 40];
    if (y > height - 50) return [96, 128, 72];
    const t = y / height;
    return [Math.round(skyTop[0] + 100 * t), Math.round(skyTop[1] + 60 * t), Math.round(skyTop[2] + 25 * t)];
  });
}
