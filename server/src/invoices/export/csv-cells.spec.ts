import Papa from 'papaparse';
import { decimalAmount, FORMULA_START, toCsv } from './csv-cells';

describe('decimalAmount', () => {
  it('writes cents as a decimal string with the minor unit', () => {
    expect(decimalAmount(4830)).toBe('48.30');
    expect(decimalAmount(5)).toBe('0.05');
    expect(decimalAmount(0)).toBe('0.00');
    expect(decimalAmount(-1200)).toBe('-12.00');
    expect(decimalAmount(123456789)).toBe('1234567.89');
  });

  it('writes no decimals for a currency without a minor unit (ISO 4217: JPY has 0)', () => {
    expect(decimalAmount(4830, 'JPY')).toBe('4830');
  });
});

describe('toCsv', () => {
  const parse = (csv: string) => Papa.parse<string[]>(csv.trimEnd(), { newline: '\r\n' }).data;

  it('writes a header row and CRLF line ends', () => {
    expect(toCsv(['Number', 'Total'], [['KR-2026-0001', '48.30']])).toBe('Number,Total\r\nKR-2026-0001,48.30\r\n');
  });

  // The trigger characters from OWASP "CSV Injection": = + - @ tab carriage return.
  it.each(['=HYPERLINK("x")', '+1+2', '-2+3', '@SUM(A1)', '\tcmd', '\rcmd', '-', '=1'])(
    'puts a quote before %j and keeps the text',
    (value) => {
      const [, row] = parse(toCsv(['Bill to'], [[value]]));
      expect(row).toEqual([`'${value}`]);
    },
  );

  it.each(['-12.00', '-5', '48.30', '0.00'])('leaves the plain number %j alone', (value) => {
    expect(toCsv(['Amount'], [[value]])).toBe(`Amount\r\n${value}\r\n`);
  });

  it('leaves ordinary text alone and quotes commas and quotes as RFC 4180 says', () => {
    const csv = toCsv(['Bill to', 'Reference'], [['Pine Street Salon, Suite 2', 'cheque "114"']]);
    expect(csv).toBe('Bill to,Reference\r\n"Pine Street Salon, Suite 2","cheque ""114"""\r\n');
    expect(FORMULA_START.test('Pine Street Salon')).toBe(false);
  });
});
