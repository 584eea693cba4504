import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { basename } from 'node:path';
import { DataSource, Repository } from 'typeorm';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import type { AppConfig } from '../config/environment';
import { todayIn } from '../stops/business-today';
import { headerProblem } from './csv/check-header';
import { parseCsv } from './csv/parse-csv';
import { templateCsv } from './csv/template-csv';
import { rowErrorFields, rowsWithErrors } from './dto/import-preview.dto';
import { CsvImport } from './entities/csv-import.entity';
import type { ImportKind, StoredRowError } from './import-kinds';
import { IMPORT_RUNNERS } from './kinds';

/** Most data rows one file may hold: enough for any route's registry, small enough for one transaction. */
export const MAX_ROWS = 20_000;

export interface UploadedCsv {
  originalname: string;
  buffer: Buffer;
}

const byRow = (a: StoredRowError, b: StoredRowError) => a.row - b.row;

function decode(buffer: Buffer): string {
  try {
    // fatal: bytes that are not UTF-8 (a spreadsheet's legacy "CSV" encodings) are refused rather than garbled.
    const text = new TextDecoder('utf-8', { fatal: true }).decode(buffer);
    if (!text.includes('\u0000')) return text;
  } catch {
    // answered below
  }
  throw new DomainError(
    'invalid_input',
    'The file is not UTF-8 text. Save it from the spreadsheet as "CSV UTF-8 (comma delimited)" and upload it again.',
  );
}

@Injectable()
export class ImportsService {
  constructor(
    @InjectRepository(CsvImport) private readonly imports: Repository<CsvImport>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly config: ConfigService<AppConfig, true>,
  ) {}

  template(kind: ImportKind): string {
    return templateCsv(IMPORT_RUNNERS[kind]);
  }

  /** Reads and checks a file against the database, keeps it, and answers what importing it would do. */
  async preview(actor: Actor, kind: ImportKind, file: UploadedCsv | undefined): Promise<CsvImport> {
    if (!file) throw new DomainError('invalid_input', 'Choose a CSV file to upload.', { file: ['Choose a file.'] });
    const runner = IMPORT_RUNNERS[kind];
    const parsed = await parseCsv(decode(file.buffer));
    const refusal = headerProblem(kind, runner, parsed);
    if (refusal) throw new DomainError('invalid_input', refusal);
    if (parsed.rows.length === 0) throw new DomainError('invalid_input', 'The file has a header but no rows under it.');
    if (parsed.rows.length > MAX_ROWS) {
      throw new DomainError(
        'invalid_input',
        `A file may hold up to ${MAX_ROWS.toLocaleString('en-US')} rows; this one has ${parsed.rows.length.toLocaleString('en-US')}. Split it and import the parts one after another.`,
      );
    }
    const checked = await runner.check(this.dataSource.manager, parsed.rows);
    const fileProblems: StoredRowError[] = parsed.problems.map((problem) => ({ ...problem, fromFile: true }));
    const record = this.imports.create({
      kind,
      fileName: basename(file.originalname.replace(/\\/g, '/')).slice(0, 255) || 'upload.csv',
      rows: parsed.rows,
      rowCount: parsed.rows.length,
      errors: [...fileProblems, ...checked.errors].sort(byRow),
      status: 'previewed',
      createdBy: actor.id,
      committedAt: null,
    });
    const { identifiers } = await this.imports.insert(record);
    return { ...record, id: String(identifiers[0]!.id), createdAt: new Date() };
  }

  /** Checks the rows again against the database as it is now and inserts them all in one transaction, or none. */
  async commit(actor: Actor, id: string): Promise<{ kind: ImportKind; created: number }> {
    const outcome = await this.dataSource
      .transaction(async (manager) => {
        // The lock makes a second commit of the same file wait, then find it already imported.
        const record = await manager.findOne(CsvImport, { where: { id }, lock: { mode: 'pessimistic_write' } });
        if (!record) throw notFound('The import');
        if (record.status === 'committed') throw new DomainError('conflict', 'This file has already been imported.');
        const checked = await IMPORT_RUNNERS[record.kind].check(manager, record.rows);
        const errors = [...record.errors.filter((error) => error.fromFile), ...checked.errors].sort(byRow);
        if (errors.length > 0) return { ok: false as const, refused: errors, record };
        const created = await checked.write({
          manager,
          actor,
          fileName: record.fileName,
          today: todayIn(this.config.get('BUSINESS_TIME_ZONE', { infer: true })),
        });
        await manager.update(CsvImport, { id }, { status: 'committed', committedAt: new Date(), errors: [] });
        return { ok: true as const, created, record };
      })
      .catch((error: unknown) => {
        throw raceRefusal(error) ?? error;
      });

    if (!outcome.ok) {
      await this.imports.update({ id }, { errors: outcome.refused });
      const bad = rowsWithErrors(outcome.refused);
      throw new DomainError(
        'invalid_input',
        `${bad} of ${outcome.record.rowCount} rows ${bad === 1 ? 'has' : 'have'} problems, so nothing was imported. Fix them in the file and upload it again.`,
        rowErrorFields(outcome.refused),
      );
    }
    return { kind: outcome.record.kind, created: outcome.created };
  }
}

/** A row that passed the check but met a record added or removed meanwhile by someone else: nothing was written. */
function raceRefusal(error: unknown): DomainError | null {
  const code = (error as { code?: unknown } | null)?.code;
  if (code !== '23505' && code !== '23503') return null;
  return new DomainError(
    'conflict',
    'Someone changed the same records while this file was importing, so nothing was imported. Upload the file again to see what changed.',
  );
}
