/**
 * The report's font, Inter 3.19 (npm package inter-ui, SIL OFL 1.1), whose .woff files carry the
 * full character set (γ, ², ³, ≤, ×, °, ½). pdfkit embeds TrueType/OpenType; left as .woff, its
 * pure-JavaScript inflate took seconds per report. So each .woff is unwrapped once per process
 * into the plain font it packs (WOFF 1.0 is zlib-compressed sfnt tables; node's zlib is native).
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { inflateSync } from "node:zlib";

const FONT_DIR = path.join(process.cwd(), "node_modules", "inter-ui", "Inter (web)");
const cache = new Map<string, Buffer>();

/** WOFF 1.0 → sfnt (W3C WOFF File Format 1.0, §3–5): same tables, decompressed, 4-byte aligned. */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.toString("latin1", 0, 4) !== "wOFF") throw new Error("not a WOFF 1.0 font");
  const numTables = woff.readUInt16BE(12);
  const tables = Array.from({ length: numTables }, (_, i) => {
    const at = 44 + i * 20;
    const offset = woff.readUInt32BE(at + 4), compLength = woff.readUInt32BE(at + 8), origLength = woff.readUInt32BE(at + 12);
    const raw = woff.subarray(offset, offset + compLength);
    return { tag: woff.subarray(at, at + 4), checksum: woff.readUInt32BE(at + 16), data: compLength < origLength ? inflateSync(raw) : raw };
  });
  const headerSize = 12 + 16 * numTables;
  const size = headerSize + tables.reduce((n, t) => n + ((t.data.length + 3) & ~3), 0);
  const out = Buffer.alloc(size);
  const entrySelector = Math.floor(Math.log2(numTables));
  const searchRange = 2 ** entrySelector * 16;
  out.writeUInt32BE(woff.readUInt32BE(4), 0); // flavor: TrueType or CFF, as packed
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(searchRange, 6);
  out.writeUInt16BE(entrySelector, 8);
  out.writeUInt16BE(numTables * 16 - searchRange, 10);
  let offset = headerSize;
  tables.forEach((t, i) => {
    const at = 12 + i * 16;
    t.tag.copy(out, at);
    out.writeUInt32BE(t.checksum, at + 4);
    out.writeUInt32BE(offset, at + 8);
    out.writeUInt32BE(t.data.length, at + 12);
    t.data.copy(out, offset);
    offset += (t.data.length + 3) & ~3;
  });
  return out;
}

/** "Inter-Regular", "Inter-SemiBold": the unwrapped font, read once per process. */
export function reportFont(name: "Inter-Regular" | "Inter-SemiBold"): Buffer {
  let font = cache.get(name);
  if (!font) {
    font = woffToSfnt(readFileSync(path.join(FONT_DIR, `${name}.woff`)));
    cache.set(name, font);
  }
  return font;
}
