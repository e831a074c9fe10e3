// Draws Taut's own icons into public/: a "T" made of a taut coupling bar with a coupler at each end,
// amber on dark slate. PNGs are rendered here with Node's built-in zlib (no image library), and the SVG
// is written from the same geometry. Run: node tests/tools/make-icons.mjs
import { writeFileSync, mkdirSync } from "node:fs";
import { deflateSync } from "node:zlib";
import { fileURLToPath } from "node:url";

const out = fileURLToPath(new URL("../../public/", import.meta.url));
mkdirSync(out, { recursive: true });

const BG = [0x1d, 0x2a, 0x36];
const MARK = [0xf0, 0xa9, 0x3b];
// Geometry in a unit square (0..1), for the full icon; `scale` shrinks it into a maskable safe zone.
const shape = { bar: { x0: 0.2, x1: 0.8, y: 0.36, h: 0.1 }, stem: { x: 0.5, y0: 0.36, y1: 0.8, w: 0.1 }, dots: { r: 0.085 }, rail: { y: 0.84, x0: 0.3, x1: 0.7, h: 0.035 } };

function inMark(x, y) {
  const { bar, stem, dots, rail } = shape;
  if (x >= bar.x0 && x <= bar.x1 && Math.abs(y - bar.y) <= bar.h / 2) return true;
  if (Math.abs(x - stem.x) <= stem.w / 2 && y >= stem.y0 && y <= stem.y1) return true;
  for (const cx of [bar.x0, bar.x1]) if ((x - cx) ** 2 + (y - bar.y) ** 2 <= dots.r ** 2) return true;
  if (x >= rail.x0 && x <= rail.x1 && Math.abs(y - rail.y) <= rail.h / 2) return true;
  return false;
}

function inRoundedSquare(x, y, r) {
  const dx = Math.max(r - x, 0, x - (1 - r));
  const dy = Math.max(r - y, 0, y - (1 - r));
  return dx * dx + dy * dy <= r * r;
}

function render(size, { maskable }) {
  const ss = 4;
  const px = Buffer.alloc(size * size * 4);
  const scale = maskable ? 0.78 : 1;
  for (let j = 0; j < size; j++) {
    for (let i = 0; i < size; i++) {
      let bg = 0;
      let mark = 0;
      for (let a = 0; a < ss; a++) {
        for (let b = 0; b < ss; b++) {
          const x = (i + (a + 0.5) / ss) / size;
          const y = (j + (b + 0.5) / ss) / size;
          const inside = maskable ? true : inRoundedSquare(x, y, 0.2);
          if (!inside) continue;
          bg++;
          const mx = (x - 0.5) / scale + 0.5;
          const my = (y - 0.5) / scale + 0.5;
          if (inMark(mx, my)) mark++;
        }
      }
      const n = ss * ss;
      const k = (j * size + i) * 4;
      const m = bg > 0 ? mark / bg : 0;
      for (let c = 0; c < 3; c++) px[k + c] = Math.round(BG[c] * (1 - m) + MARK[c] * m);
      px[k + 3] = Math.round((bg / n) * 255);
    }
  }
  return png(size, size, px);
}

function crc32(buf) {
  let c;
  const table = (crc32.t ??= Array.from({ length: 256 }, (_, n) => {
    c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    return c >>> 0;
  }));
  let crc = 0xffffffff;
  for (const b of buf) crc = table[(crc ^ b) & 0xff] ^ (crc >>> 8);
  return (crc ^ 0xffffffff) >>> 0;
}

function chunk(type, data) {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const td = Buffer.concat([Buffer.from(type, "ascii"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(td));
  return Buffer.concat([len, td, crc]);
}

function png(w, h, rgba) {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 6; // RGBA
  const raw = Buffer.alloc((w * 4 + 1) * h);
  for (let y = 0; y < h; y++) {
    raw[y * (w * 4 + 1)] = 0; // filter: none
    rgba.copy(raw, y * (w * 4 + 1) + 1, y * w * 4, (y + 1) * w * 4);
  }
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk("IHDR", ihdr), chunk("IDAT", deflateSync(raw, { level: 9 })), chunk("IEND", Buffer.alloc(0))]);
}

function svg() {
  const { bar, stem, dots, rail } = shape;
  const hex = (c) => `#${c.map((v) => v.toString(16).padStart(2, "0")).join("")}`;
  const s = (v) => +(v * 512).toFixed(1);
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 512 512">
  <rect width="512" height="512" rx="${s(0.2)}" fill="${hex(BG)}"/>
  <g fill="${hex(MARK)}">
    <rect x="${s(bar.x0)}" y="${s(bar.y - bar.h / 2)}" width="${s(bar.x1 - bar.x0)}" height="${s(bar.h)}"/>
    <rect x="${s(stem.x - stem.w / 2)}" y="${s(stem.y0)}" width="${s(stem.w)}" height="${s(stem.y1 - stem.y0)}"/>
    <circle cx="${s(bar.x0)}" cy="${s(bar.y)}" r="${s(dots.r)}"/>
    <circle cx="${s(bar.x1)}" cy="${s(bar.y)}" r="${s(dots.r)}"/>
    <rect x="${s(rail.x0)}" y="${s(rail.y - rail.h / 2)}" width="${s(rail.x1 - rail.x0)}" height="${s(rail.h)}"/>
  </g>
</svg>
`;
}

writeFileSync(`${out}icon-192.png`, render(192, { maskable: false }));
writeFileSync(`${out}icon-512.png`, render(512, { maskable: false }));
writeFileSync(`${out}icon-maskable-512.png`, render(512, { maskable: true }));
writeFileSync(`${out}icon.svg`, svg());
console.log("icons written to", out);
