import { inflateSync } from 'node:zlib';

const WOFF_SIGNATURE = 0x774f4646; // "wOFF"
const WOFF_HEADER_BYTES = 44;
const WOFF_ENTRY_BYTES = 20;
const SFNT_HEADER_BYTES = 12;
const SFNT_RECORD_BYTES = 16;

const padded = (length: number) => (length + 3) & ~3;

/**
 * Unpacks a WOFF 1.0 font into the TrueType/OpenType (sfnt) file it wraps, following the W3C Recommendation "WOFF
 * File Format 1.0" (2012): a 44-byte header, a directory of 20-byte entries sorted by tag, and each table zlib-packed
 * when that made it smaller. pdfkit reads WOFF too, but its font library inflates the tables in JavaScript every
 * time a document asks for one (about 0.4 s of each invoice); Node's zlib does it once here.
 */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.length < WOFF_HEADER_BYTES || woff.readUInt32BE(0) !== WOFF_SIGNATURE) {
    throw new Error('Not a WOFF 1.0 font (the file does not start with "wOFF").');
  }
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables = Array.from({ length: numTables }, (_, index) => {
    const entry = WOFF_HEADER_BYTES + index * WOFF_ENTRY_BYTES;
    const [tag, offset, compLength, origLength, checksum] = [0, 4, 8, 12, 16].map((at) =>
      woff.readUInt32BE(entry + at),
    ) as [number, number, number, number, number];
    const stored = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(stored) : stored;
    if (data.length !== origLength) throw new Error(`WOFF table ${index} unpacks to the wrong length.`);
    return { tag, checksum, data };
  });

  // The sfnt offset table's binary-search fields, as the OpenType specification defines them.
  const power = 2 ** Math.floor(Math.log2(Math.max(1, numTables)));
  const headerBytes = SFNT_HEADER_BYTES + numTables * SFNT_RECORD_BYTES;
  const size = tables.reduce((total, table) => total + padded(table.data.length), headerBytes);
  const sfnt = Buffer.alloc(size);
  sfnt.writeUInt32BE(flavor, 0);
  sfnt.writeUInt16BE(numTables, 4);
  sfnt.writeUInt16BE(power * 16, 6);
  sfnt.writeUInt16BE(Math.log2(power), 8);
  sfnt.writeUInt16BE(numTables * 16 - power * 16, 10);
  let offset = headerBytes;
  tables.forEach((table, index) => {
    const record = SFNT_HEADER_BYTES + index * SFNT_RECORD_BYTES;
    sfnt.writeUInt32BE(table.tag, record);
    sfnt.writeUInt32BE(table.checksum, record + 4);
    sfnt.writeUInt32BE(offset, record + 8);
    sfnt.writeUInt32BE(table.data.length, record + 12);
    table.data.copy(sfnt, offset);
    offset += padded(table.data.length);
  });
  return sfnt;
}
