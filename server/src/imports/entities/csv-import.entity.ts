import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { CsvRecord, ImportKind, ImportStatus, StoredRowError } from '../import-kinds';

/** One uploaded CSV file: kept from the preview so the commit imports exactly the rows that were shown. */
@Entity({ name: 'csv_imports' })
export class CsvImport {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 16 })
  kind: ImportKind;

  @Column({ name: 'file_name', type: 'varchar', length: 255 })
  fileName: string;

  /** The parsed data rows, as text, in file order. */
  @Column({ type: 'jsonb' })
  rows: CsvRecord[];

  @Column({ name: 'row_count', type: 'integer' })
  rowCount: number;

  /** The problems found at the latest check (preview, or a refused commit). */
  @Column({ type: 'jsonb', default: [] })
  errors: StoredRowError[];

  @Column({ type: 'varchar', length: 16, default: 'previewed' })
  status: ImportStatus;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'committed_at', type: 'timestamptz', nullable: true })
  committedAt: Date | null;
}
