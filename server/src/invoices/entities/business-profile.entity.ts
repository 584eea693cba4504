import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** The one business the invoices come from: what the PDF's header says, the logo, payment terms and reminder days. */
@Entity({ name: 'business_profile' })
export class BusinessProfile {
  @PrimaryColumn({ type: 'smallint', default: 1 })
  id: number;

  @Column({ type: 'varchar', length: 120, default: '' })
  name: string;

  @Column({ type: 'varchar', length: 200, default: '' })
  street: string;

  @Column({ type: 'varchar', length: 100, default: '' })
  city: string;

  @Column({ type: 'varchar', length: 100, default: '' })
  region: string;

  @Column({ name: 'postal_code', type: 'varchar', length: 20, default: '' })
  postalCode: string;

  @Column({ type: 'varchar', length: 2, default: 'US' })
  country: string;

  @Column({ type: 'varchar', length: 40, default: '' })
  phone: string;

  @Column({ type: 'varchar', length: 254, default: '' })
  email: string;

  @Column({ type: 'varchar', length: 200, default: '' })
  website: string;

  @Column({ name: 'tax_id', type: 'varchar', length: 40, default: '' })
  taxId: string;

  /** The logo's file name under DATA_DIR/logos (a PNG made from the upload); null: none. */
  @Column({ name: 'logo_file', type: 'varchar', length: 200, nullable: true })
  logoFile: string | null;

  @Column({ name: 'invoice_footer', type: 'varchar', length: 1000, default: '' })
  invoiceFooter: string;

  /** Days from the issue date to the due date. */
  @Column({ name: 'payment_terms_days', type: 'smallint', default: 14 })
  paymentTermsDays: number;

  /** Days after the due date on which an unpaid invoice gets a reminder, ascending. */
  @Column({ name: 'reminder_days', type: 'smallint', array: true, default: [7, 21, 45] })
  reminderDays: number[];

  @Column({ name: 'updated_by', type: 'uuid', nullable: true })
  updatedBy: string | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
