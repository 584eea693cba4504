import { toBuffer } from 'qrcode';
import sharp from 'sharp';
import { labelDescription, labelSlot, LABELS_PER_SHEET, qrModuleRuns, SHEET } from './label-sheet';
import { renderLabels } from './shear-labels.service';

const label = (serial: number) => ({
  tagCode: `KR-${String(serial).padStart(6, '0')}`,
  customerName: 'Mara Quill',
  make: 'Corvane',
  model: 'Series 7',
  lengthIn: 6.5,
  toolKind: 'straight' as const,
});

describe('label sheet layout', () => {
  it('fills 3 columns by 10 rows of 2 5/8 x 1 in labels inside a Letter page, then starts a new sheet', () => {
    expect(LABELS_PER_SHEET).toBe(30);
    expect(labelSlot(0)).toEqual({ page: 0, x: 13.5, y: 36 });
    expect(labelSlot(1)).toEqual({ page: 0, x: 13.5 + 189 + 9, y: 36 });
    expect(labelSlot(3)).toEqual({ page: 0, x: 13.5, y: 36 + 72 });
    const last = labelSlot(29);
    expect(last.page).toBe(0);
    expect(last.x + SHEET.labelWidth).toBeLessThanOrEqual(SHEET.width - 13.5);
    expect(last.y + SHEET.labelHeight).toBeLessThanOrEqual(SHEET.height - 36);
    expect(labelSlot(30)).toEqual({ page: 1, x: 13.5, y: 36 });
  });

  it('describes the shear by make and model, or by tool kind when neither is known', () => {
    expect(labelDescription(label(1))).toBe('Corvane Series 7, 6.5 in');
    expect(labelDescription({ ...label(1), make: '', model: ' ', toolKind: 'thinning', lengthIn: 6 })).toBe(
      'thinning shear, 6 in',
    );
  });
});

describe('renderLabels', () => {
  it('makes one Letter page per thirty labels', async () => {
    const pdf = await renderLabels(Array.from({ length: 31 }, (_, i) => label(i + 1)));
    const text = pdf.toString('latin1');
    expect(text.startsWith('%PDF-')).toBe(true);
    expect(text.match(/\/Type \/Page\b(?!s)/g)).toHaveLength(2);
    expect(text).toMatch(/\/MediaBox \[0 0 612 792\]/);
  });
});

describe('qrModuleRuns', () => {
  it('draws the three finder squares of a QR code in the corners', () => {
    const { size, runs } = qrModuleRuns('KR-000123');
    expect(size).toBe(21);
    const row = (n: number) => runs.filter((run) => run.row === n);
    // Top row: a 7-module finder edge at each end; bottom row: one at the left only.
    expect(row(0)[0]).toEqual({ row: 0, column: 0, length: 7 });
    expect(row(0).at(-1)).toEqual({ row: 0, column: size - 7, length: 7 });
    expect(row(size - 1)[0]).toEqual({ row: size - 1, column: 0, length: 7 });
    expect(row(size - 1).some((run) => run.column + run.length === size && run.length >= 7)).toBe(false);
  });

  it('matches, module for module, the PNG the qrcode package renders for the same text', async () => {
    const { size, runs } = qrModuleRuns('KR-004217');
    const side = size + 2;
    const drawn = new Uint8Array(side * side).fill(255);
    for (const run of runs)
      drawn.fill(0, (run.row + 1) * side + run.column + 1, (run.row + 1) * side + run.column + 1 + run.length);
    const png = await toBuffer('KR-004217', { type: 'png', errorCorrectionLevel: 'M', margin: 1, scale: 1 });
    const { data, info } = await sharp(png).greyscale().raw().toBuffer({ resolveWithObject: true });
    expect([info.width, info.height]).toEqual([side, side]);
    expect(Array.from(data).map((v) => (v < 128 ? 0 : 255))).toEqual(Array.from(drawn));
  });
});
