/**
 * WOFF 1.0 → SFNT (TrueType/OpenType) in memory, per the W3C WOFF File Format 1.0 (§4 header, §5 table
 * directory: each table zlib-compressed unless its compLength equals its origLength). pdfkit would inflate
 * the WOFF on every document it is embedded in; decoding it once per process and handing pdfkit the
 * plain font saves that work on every PDF. The glyphs are the same file's: the font stays the npm
 * package's.
 */
import { inflateSync } from "node:zlib";

export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.readUInt32BE(0) !== 0x774f4646) throw new Error("Not a WOFF 1.0 file (signature 'wOFF' missing).");
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables: { tag: number; checksum: number; data: Buffer }[] = [];
  for (let i = 0; i < numTables; i++) {
    const e = 44 + i * 20;
    const tag = woff.readUInt32BE(e);
    const offset = woff.readUInt32BE(e + 4);
    const compLength = woff.readUInt32BE(e + 8);
    const origLength = woff.readUInt32BE(e + 12);
    const checksum = woff.readUInt32BE(e + 16);
    const raw = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(raw) : Buffer.from(raw);
    if (data.length !== origLength) throw new Error(`WOFF table ${i} inflates to ${data.length} bytes, expected ${origLength}.`);
    tables.push({ tag, checksum, data });
  }
  // SFNT header and directory (OpenType spec, "Table directory"), tables 4-byte aligned in tag order.
  let pow = 1;
  let log = 0;
  while (pow * 2 <= numTables) {
    pow *= 2;
    log++;
  }
  const header = Buffer.alloc(12 + numTables * 16);
  header.writeUInt32BE(flavor, 0);
  header.writeUInt16BE(numTables, 4);
  header.writeUInt16BE(pow * 16, 6);
  header.writeUInt16BE(log, 8);
  header.writeUInt16BE(numTables * 16 - pow * 16, 10);
  const sorted = [...tables].sort((a, b) => a.tag - b.tag);
  const chunks: Buffer[] = [header];
  let offset = header.length;
  sorted.forEach((t, i) => {
    const d = 12 + i * 16;
    header.writeUInt32BE(t.tag, d);
    header.writeUInt32BE(t.checksum, d + 4);
    header.writeUInt32BE(offset, d + 8);
    header.writeUInt32BE(t.data.length, d + 12);
    const padded = Buffer.alloc((t.data.length + 3) & ~3);
    t.data.copy(padded);
    chunks.push(padded);
    offset += padded.length;
  });
  return Buffer.concat(chunks);
}
