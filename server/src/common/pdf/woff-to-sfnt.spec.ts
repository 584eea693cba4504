import { readFileSync } from 'node:fs';
import PDFDocument from 'pdfkit';
import { INTER_BOLD_WOFF, INTER_REGULAR_WOFF } from './fonts';
import { woffToSfnt } from './woff-to-sfnt';

/** The table checksum of the OpenType specification ("Calculating checksums"): the sum of its uint32s, mod 2^32. */
function tableChecksum(table: Buffer): number {
  const words = Buffer.alloc((table.length + 3) & ~3);
  table.copy(words);
  let sum = 0;
  for (let at = 0; at < words.length; at += 4) sum = (sum + words.readUInt32BE(at)) >>> 0;
  return sum;
}

function tableRecords(sfnt: Buffer) {
  return Array.from({ length: sfnt.readUInt16BE(4) }, (_, index) => {
    const record = 12 + index * 16;
    return {
      tag: sfnt.toString('latin1', record, record + 4),
      checksum: sfnt.readUInt32BE(record + 4),
      data: sfnt.subarray(
        sfnt.readUInt32BE(record + 8),
        sfnt.readUInt32BE(record + 8) + sfnt.readUInt32BE(record + 12),
      ),
    };
  });
}

const SAMPLE = 'Invoice KR-2026-0007 · Convex 6.5 in straight shear, $1,234.56 — Larkhaven (demo) ÆÉßñ';

describe('woffToSfnt', () => {
  it.each([
    ['regular', INTER_REGULAR_WOFF],
    ['bold', INTER_BOLD_WOFF],
  ])('unpacks Inter %s into tables whose checksums match the ones the WOFF recorded', (_weight, file) => {
    const woff = readFileSync(file);
    const sfnt = woffToSfnt(woff);
    const records = tableRecords(sfnt);
    expect(records.length).toBe(woff.readUInt16BE(12));
    expect(records.map((r) => r.tag)).toEqual([...records.map((r) => r.tag)].sort());
    expect(records.map((r) => r.tag)).toEqual(expect.arrayContaining(['cmap', 'head', 'hmtx', 'name']));
    for (const record of records) {
      // 'head' is summed with its checkSumAdjustment field as zero (OpenType specification, 'head' table).
      const data =
        record.tag === 'head'
          ? Buffer.concat([record.data.subarray(0, 8), Buffer.alloc(4), record.data.subarray(12)])
          : record.data;
      expect({ tag: record.tag, checksum: tableChecksum(data) }).toEqual({
        tag: record.tag,
        checksum: record.checksum,
      });
    }
  });

  it('measures text exactly as pdfkit does from the WOFF itself', () => {
    const doc = new PDFDocument();
    doc.registerFont('from-woff', INTER_REGULAR_WOFF);
    doc.registerFont('from-sfnt', woffToSfnt(readFileSync(INTER_REGULAR_WOFF)));
    const width = (font: string) => doc.font(font).fontSize(11).widthOfString(SAMPLE);
    expect(width('from-sfnt')).toBeGreaterThan(100);
    expect(width('from-sfnt')).toBe(width('from-woff'));
  });

  it('refuses a file that is not WOFF 1.0', () => {
    expect(() => woffToSfnt(Buffer.from('wOF2 and then some bytes that are not a font at all, padded out'))).toThrow(
      /Not a WOFF 1.0 font/,
    );
  });
});
