import type { EntityManager } from 'typeorm';
import type { Actor } from '../../auth/actor';
import type { CsvRecord, ImportRowError } from '../import-kinds';
import { forEachInChunks } from '../in-chunks';
import type { CellProblem, RowRead } from '../rows/row-reader';

/** What inserting the rows needs besides them. */
export interface WriteContext {
  manager: EntityManager;
  actor: Actor;
  fileName: string;
  /** Today in the business's time zone, "YYYY-MM-DD". */
  today: string;
}

export type Resolve<Draft, Ready> = (draft: Draft, row: number) => { ready: Ready | null; problems: CellProblem[] };

/** One kind of file: its columns, its row rules, its bulk look-ups and its inserts. */
export interface ImportHandler<Draft, Ready> {
  columns: readonly string[];
  required: readonly string[];
  /** The template's example row. */
  example: CsvRecord;
  /** Checks one row on its own; pure. */
  read(record: CsvRecord): RowRead<Draft>;
  /** Looks up, in a few queries for the whole file, what the rows refer to; answers the check for each row. */
  prepare(manager: EntityManager, drafts: readonly Draft[]): Promise<Resolve<Draft, Ready>>;
  /** Inserts every row, in multi-row statements, inside the caller's transaction. */
  insert(context: WriteContext, rows: readonly Ready[]): Promise<void>;
}

export interface CheckedRows {
  /** Every problem, by row. */
  errors: ImportRowError[];
  /** Inserts the rows; only call it when there are no errors. */
  write(context: WriteContext): Promise<number>;
}

/** A handler with its row types hidden, so the service can hold the three kinds in one table. */
export interface ImportRunner {
  columns: readonly string[];
  required: readonly string[];
  example: CsvRecord;
  check(manager: EntityManager, records: readonly CsvRecord[]): Promise<CheckedRows>;
}

export function runnerFor<Draft, Ready>(handler: ImportHandler<Draft, Ready>): ImportRunner {
  return {
    columns: handler.columns,
    required: handler.required,
    example: handler.example,
    async check(manager, records) {
      const errors: ImportRowError[] = [];
      const report = (row: number, problems: readonly CellProblem[]) => {
        for (const problem of problems) errors.push({ row, ...problem });
      };
      const drafts: { draft: Draft; row: number }[] = [];
      await forEachInChunks(records, (record, index) => {
        const { draft, problems } = handler.read(record);
        report(index + 1, problems);
        if (draft) drafts.push({ draft, row: index + 1 });
      });
      const resolve = await handler.prepare(
        manager,
        drafts.map((item) => item.draft),
      );
      const ready: Ready[] = [];
      await forEachInChunks(drafts, ({ draft, row }) => {
        const outcome = resolve(draft, row);
        report(row, outcome.problems);
        if (outcome.ready) ready.push(outcome.ready);
      });
      errors.sort((a, b) => a.row - b.row);
      return {
        errors,
        write: async (context) => {
          await handler.insert(context, ready);
          return ready.length;
        },
      };
    },
  };
}
