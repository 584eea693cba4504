import { DEFAULT_CADENCE_WEEKS } from '@keenroute/shared';
import type { ConfigService } from '@nestjs/config';
import Papa from 'papaparse';
import type { DataSource, Repository } from 'typeorm';
import type { Actor } from '../auth/actor';
import { BIDI_CONTROL_MESSAGE } from '../common/validation/unsafe-input';
import type { AppConfig } from '../config/environment';
import { headerProblem } from './csv/check-header';
import { parseCsv } from './csv/parse-csv';
import type { CsvImport } from './entities/csv-import.entity';
import { forEachInChunks } from './in-chunks';
import { IMPORT_KINDS } from './import-kinds';
import { ImportsService } from './imports.service';
import { IMPORT_RUNNERS } from './kinds';
import { customersHandler } from './kinds/customers.kind';
import { shearsHandler } from './kinds/shears.kind';
import { stopsHandler } from './kinds/stops.kind';
import { customerResolver, readCustomerRow, type CustomerDraft } from './rows/customer-rows';
import { readShearRow, shearResolver } from './rows/shear-rows';
import { readStopRow, stopDuplicateCheck, stopKey, type StopDraft } from './rows/stop-rows';

const stopRow = { name: 'Heron Lane Grooming', kind: 'grooming-shop', street: '12 Heron Lane', city: 'Larkhaven' };
const shearRow = {
  customer_email: 'Robin@Demo.Keenroute.test',
  length_in: '6.5',
  edge_type: 'convex',
  tool_kind: 'straight',
};

describe('stop rows', () => {
  it('fills the defaults: cadence by kind, customer billing, no tax, US, no coordinates', () => {
    const { draft, problems } = readStopRow(stopRow);
    expect(problems).toEqual([]);
    expect(draft).toMatchObject({
      cadenceWeeks: DEFAULT_CADENCE_WEEKS['grooming-shop'],
      billingMode: 'customer',
      taxRateBp: 0,
      country: 'US',
      latitude: null,
      longitude: null,
      email: null,
    });
  });

  it('reads kinds as spreadsheets spell them and keeps given values', () => {
    const { draft } = readStopRow({ ...stopRow, kind: 'Grooming Shop', cadence_weeks: '4', tax_rate_bp: '825' });
    expect(draft).toMatchObject({ kind: 'grooming-shop', cadenceWeeks: 4, taxRateBp: 825 });
  });

  it('reports every bad cell of a row at once, with the shared rules’ messages', () => {
    const { draft, problems } = readStopRow({
      name: '',
      kind: 'spa',
      street: '1 Alder Row',
      city: 'Larkhaven',
      cadence_weeks: '60',
      tax_rate_bp: '3500',
      latitude: '44.8',
      email: 'not-an-address',
    });
    expect(draft).toBeNull();
    expect(problems.map((p) => p.column)).toEqual([
      'name',
      'kind',
      'email',
      'cadence_weeks',
      'tax_rate_bp',
      'longitude',
    ]);
    expect(problems[3]!.message).toMatch(/from 1 to 52/);
    expect(problems[4]!.message).toMatch(/basis points/);
  });

  it('refuses a name with a direction override, as the API does for typed text', () => {
    const { draft, problems } = readStopRow({ ...stopRow, name: 'Salon \u202Egnp.exe' });
    expect(draft).toBeNull();
    expect(problems).toEqual([{ column: 'name', message: BIDI_CONTROL_MESSAGE }]);
  });

  it('finds duplicates within the file and against the stops already there, ignoring case', () => {
    const first = readStopRow(stopRow).draft!;
    const again = readStopRow({ ...stopRow, name: 'HERON LANE GROOMING', street: '12 heron lane' }).draft!;
    const other = readStopRow({ ...stopRow, name: 'Cutler Street Barbers' }).draft!;
    const taken: StopDraft = { ...other, name: 'cutler street barbers' };
    const check = stopDuplicateCheck(new Set([stopKey(taken)]));
    expect(check(first, 1)).toEqual([]);
    expect(check(again, 2)).toEqual([{ column: 'name', message: 'Same name and address as row 1.' }]);
    expect(check(other, 3)[0]!.message).toMatch(/already in Keenroute/);
  });
});

describe('customer rows', () => {
  const stops = new Map([
    ['brassmill cuts', [{ id: 's1', name: 'Brassmill Cuts', street: '10 Brassmill Road' }]],
    [
      'the shear shed',
      [
        { id: 's2', name: 'The Shear Shed', street: '5 Kestrel Way' },
        { id: 's3', name: 'The Shear Shed', street: '9 Tanner Boulevard' },
      ],
    ],
  ]);
  const read = (record: Record<string, string>): CustomerDraft => {
    const { draft, problems } = readCustomerRow({ name: 'Robin Example', ...record });
    expect(problems).toEqual([]);
    return draft!;
  };

  it('reads consent words and refuses others', () => {
    expect(read({ visit_notice_consent: 'YES' }).visitNoticeConsent).toBe(true);
    expect(read({ visit_notice_consent: '0' }).visitNoticeConsent).toBe(false);
    expect(read({}).visitNoticeConsent).toBe(false);
    expect(readCustomerRow({ name: 'R', visit_notice_consent: 'maybe' }).problems[0]!.column).toBe(
      'visit_notice_consent',
    );
  });

  it('finds the stop by name, and by street when two share the name', () => {
    const resolve = customerResolver(new Set(), stops);
    expect(resolve(read({ stop_name: 'brassmill CUTS' }), 1).ready?.stopId).toBe('s1');
    expect(resolve(read({ stop_name: 'The Shear Shed', stop_street: '9 tanner boulevard' }), 2).ready?.stopId).toBe(
      's3',
    );
    expect(resolve(read({}), 3).ready?.stopId).toBeNull();
  });

  it('says when the stop is missing or ambiguous', () => {
    const resolve = customerResolver(new Set(), stops);
    expect(resolve(read({ stop_name: 'Nowhere' }), 1).problems[0]!.message).toMatch(/No stop is named "Nowhere"/);
    const ambiguous = resolve(read({ stop_name: 'The Shear Shed' }), 2).problems[0]!;
    expect(ambiguous).toMatchObject({ column: 'stop_street' });
    expect(ambiguous.message).toMatch(/2 stops are named/);
    expect(resolve(read({ stop_name: 'The Shear Shed', stop_street: '1 Elsewhere' }), 3).problems[0]!.column).toBe(
      'stop_street',
    );
  });

  it('finds duplicate e-mails in the file and in the database, ignoring case', () => {
    const resolve = customerResolver(new Set(['taken@demo.keenroute.test']), stops);
    expect(resolve(read({ email: 'Sam@demo.keenroute.test' }), 1).problems).toEqual([]);
    expect(resolve(read({ email: 'sam@DEMO.keenroute.test' }), 2).problems[0]!.message).toBe('Same e-mail as row 1.');
    expect(resolve(read({ email: 'TAKEN@demo.keenroute.test' }), 3).problems[0]!.message).toMatch(/already/);
  });
});

describe('shear rows', () => {
  it('reads a good row with defaults, a lower-cased e-mail and micro-serrated as serrated', () => {
    const { draft } = readShearRow({ ...shearRow, edge_type: 'Micro-serrated', length_in: '7 in' });
    expect(draft).toMatchObject({
      customerEmail: 'robin@demo.keenroute.test',
      lengthIn: 7,
      edgeType: 'serrated',
      handedness: 'right',
      use: 'hair',
    });
  });

  it('refuses lengths off the quarter-inch steps or out of range, as validateLength does', () => {
    expect(readShearRow({ ...shearRow, length_in: '6.3' }).problems[0]!.message).toMatch(/quarter inches/);
    expect(readShearRow({ ...shearRow, length_in: '14' }).problems[0]!.message).toMatch(/between 3 and 12/);
    expect(readShearRow({ ...shearRow, length_in: 'six' }).problems[0]!.column).toBe('length_in');
  });

  it('names each bad code column', () => {
    const { problems } = readShearRow({ ...shearRow, edge_type: 'wavy', tool_kind: 'spoon', handedness: 'both' });
    expect(problems.map((p) => p.column)).toEqual(['edge_type', 'tool_kind', 'handedness']);
  });

  it('needs a customer known by the e-mail', () => {
    const resolve = shearResolver(new Map([['robin@demo.keenroute.test', 'c1']]));
    const draft = readShearRow(shearRow).draft!;
    expect(resolve(draft).ready?.customerId).toBe('c1');
    expect(resolve({ ...draft, customerEmail: 'ghost@demo.keenroute.test' }).problems[0]!.column).toBe(
      'customer_email',
    );
  });
});

describe('parsing and the header', () => {
  it('keeps quoted commas and line breaks, trims names and values, and skips blank lines', async () => {
    const text = '\uFEFF Name ,KIND,street,city\r\n"Cuts, Inc","salon","1 Alder\nRow",Larkhaven\r\n\r\n , , , \r\n';
    const parsed = await parseCsv(text);
    expect(parsed.columns).toEqual(['name', 'kind', 'street', 'city']);
    expect(parsed.rows).toEqual([{ name: 'Cuts, Inc', kind: 'salon', street: '1 Alder\nRow', city: 'Larkhaven' }]);
  });

  it('reports rows whose value count differs from the header, counting rows from 1', async () => {
    const parsed = await parseCsv('a,b\n1,2\n1,2,3\n4\n');
    expect(parsed.problems.map((p) => p.row)).toEqual([2, 3]);
    expect(parsed.rows[1]).toEqual({ a: '1', b: '2' });
  });

  it('parses a large file across many slices in order', async () => {
    const lines = Array.from({ length: 3000 }, (_, i) => `x${i}@demo.keenroute.test,"note, ${i}"`);
    const parsed = await parseCsv(`customer_email,notes\n${lines.join('\n')}`);
    expect(parsed.rows).toHaveLength(3000);
    expect(parsed.rows[2999]).toEqual({ customer_email: 'x2999@demo.keenroute.test', notes: 'note, 2999' });
    expect(parsed.problems).toEqual([]);
  });

  it('names unknown, missing, repeated and unnamed columns', async () => {
    const runner = IMPORT_RUNNERS.stops;
    const parsed = await parseCsv('name,name,colour,,street\nA,B,red,x,1 Alder Row\n');
    const message = headerProblem('stops', runner, parsed)!;
    expect(message).toMatch(/missing: kind, city\./);
    expect(message).toMatch(/not part of a stops file: colour\./);
    expect(message).toMatch(/names name more than once/);
    expect(message).toMatch(/Column 4 has values but no name/);
    expect(headerProblem('stops', runner, await parseCsv('name,kind,street,city,\n'))).toBeNull();
  });
});

describe('templates', () => {
  it.each(IMPORT_KINDS)('the %s template is a header and one example row that passes its own checks', async (kind) => {
    const service = new ImportsService(
      {} as Repository<CsvImport>,
      {} as DataSource,
      {} as ConfigService<AppConfig, true>,
    );
    const text = service.template(kind);
    const parsed = await parseCsv(text);
    expect(parsed.columns).toEqual([...IMPORT_RUNNERS[kind].columns]);
    expect(parsed.rows).toHaveLength(1);
    const handler = { stops: stopsHandler, customers: customersHandler, shears: shearsHandler }[kind];
    expect(handler.read(parsed.rows[0]!).problems).toEqual([]);
    expect(text).toMatch(kind === 'stops' ? /Larkhaven/ : /demo\.keenroute\.test/);
  });
});

describe('checking without blocking', () => {
  it('lets other work run between chunks of rows', async () => {
    const visited: number[] = [];
    let otherWorkRanAt: number | undefined;
    setImmediate(() => {
      otherWorkRanAt = visited.length;
    });
    await forEachInChunks(
      Array.from({ length: 1000 }, (_, i) => i),
      (item) => visited.push(item),
      250,
    );
    expect(visited).toHaveLength(1000);
    expect(otherWorkRanAt).toBe(250);
  });
});

describe('ImportsService.preview', () => {
  const actor: Actor = { id: 'u1', email: 'office@demo.keenroute.test', name: 'Office', role: 'office' };
  let query: jest.Mock;
  let sut: ImportsService;
  let inserted: Partial<CsvImport> | undefined;

  beforeEach(() => {
    query = jest.fn().mockResolvedValue([{ id: 'c1', email: 'robin@demo.keenroute.test' }]);
    const imports = {
      create: (value: Partial<CsvImport>) => value,
      insert: jest.fn().mockImplementation((value: Partial<CsvImport>) => {
        inserted = value;
        return Promise.resolve({ identifiers: [{ id: 'import-1' }] });
      }),
    } as unknown as Repository<CsvImport>;
    sut = new ImportsService(
      imports,
      { manager: { query } } as unknown as DataSource,
      {} as ConfigService<AppConfig, true>,
    );
  });

  const file = (rows: Record<string, string>[], name = 'shears.csv') => ({
    originalname: name,
    buffer: Buffer.from(Papa.unparse(rows)),
  });

  it('looks up every e-mail of the file in one query and reports rows by number', async () => {
    const rows = [shearRow, { ...shearRow, customer_email: 'ghost@demo.keenroute.test' }, { ...shearRow }];
    const record = await sut.preview(actor, 'shears', file(rows, 'C:\\exports\\shears.csv'));
    expect(query).toHaveBeenCalledTimes(1);
    expect(query.mock.calls[0][1]).toEqual([['robin@demo.keenroute.test', 'ghost@demo.keenroute.test']]);
    expect(record).toMatchObject({ id: 'import-1', fileName: 'shears.csv', rowCount: 3, createdBy: 'u1' });
    expect(record.errors).toEqual([{ row: 2, column: 'customer_email', message: expect.stringMatching(/ghost/) }]);
    expect(inserted?.rows).toHaveLength(3);
  });

  it('refuses a file with unknown or missing columns, one that is not UTF-8, and an empty one', async () => {
    await expect(sut.preview(actor, 'shears', file([{ ...shearRow, colour: 'red' }]))).rejects.toThrow(/colour/);
    await expect(sut.preview(actor, 'shears', file([{ make: 'x' }]))).rejects.toThrow(/customer_email/);
    const latin1 = { originalname: 'x.csv', buffer: Buffer.from('customer_email,make\nr@x.test,Sch\xf6n\n', 'latin1') };
    await expect(sut.preview(actor, 'shears', latin1)).rejects.toThrow(/UTF-8/);
    const headerOnly = { originalname: 'x.csv', buffer: Buffer.from('customer_email,length_in,edge_type,tool_kind\n') };
    await expect(sut.preview(actor, 'shears', headerOnly)).rejects.toThrow(/no rows/);
    await expect(sut.preview(actor, 'shears', undefined)).rejects.toMatchObject({ code: 'invalid_input' });
    expect(query).not.toHaveBeenCalled();
  });

  it('keeps problems with the file itself, marked so a commit sees them again', async () => {
    const buffer = Buffer.from('customer_email,length_in,edge_type,tool_kind\nrobin@demo.keenroute.test,6,convex\n');
    const record = await sut.preview(actor, 'shears', { originalname: 'x.csv', buffer });
    expect(record.errors).toContainEqual(expect.objectContaining({ row: 1, column: null, fromFile: true }));
  });
});
