import type { EdgeType, Handedness, ShearStatus, ShearUse, ToolKind } from '@keenroute/shared';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** numeric comes back from pg as a string; lengths are quarter inches, exact in a double. */
const lengthTransformer = {
  to: (value: number) => value,
  from: (value: string | null) => (value === null ? value : Number(value)),
};

@Entity({ name: 'shears' })
export class Shear {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** KR-000123: made from the shear_tag_serial sequence, never reused, printed on the label. */
  @Column({ name: 'tag_code', type: 'varchar', length: 20, unique: true })
  tagCode: string;

  @Column({ name: 'customer_id', type: 'uuid' })
  customerId: string;

  @Column({ type: 'varchar', length: 80, default: '' })
  make: string;

  @Column({ type: 'varchar', length: 80, default: '' })
  model: string;

  @Column({ name: 'length_in', type: 'numeric', precision: 4, scale: 2, transformer: lengthTransformer })
  lengthIn: number;

  @Column({ name: 'edge_type', type: 'varchar', length: 16 })
  edgeType: EdgeType;

  @Column({ name: 'tool_kind', type: 'varchar', length: 16 })
  toolKind: ToolKind;

  @Column({ type: 'varchar', length: 8, default: 'right' })
  handedness: Handedness;

  @Column({ type: 'varchar', length: 16, default: 'hair' })
  use: ShearUse;

  @Column({ type: 'varchar', length: 2000, default: '' })
  notes: string;

  @Column({ type: 'varchar', length: 16, default: 'in-service' })
  status: ShearStatus;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
