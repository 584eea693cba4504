import type { RateCard } from '@keenroute/shared';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/**
 * One saved version of the price list. Rows are only ever added: the newest is in force, and a ticket keeps the
 * prices it was given, so a change never rewrites an existing ticket.
 */
@Entity({ name: 'rate_cards' })
export class RateCardVersion {
  @PrimaryGeneratedColumn('identity', { generatedIdentity: 'ALWAYS' })
  version: number;

  @Column({ type: 'jsonb' })
  card: RateCard;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
