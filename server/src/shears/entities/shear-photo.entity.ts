import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export const PHOTO_CONTENT_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type PhotoContentType = (typeof PHOTO_CONTENT_TYPES)[number];

export const PHOTO_STAGES = ['before', 'after'] as const;
export type PhotoStage = (typeof PHOTO_STAGES)[number];

/** A photo of a shear; the file's name on disk is made from the id, never from the upload's name. */
@Entity({ name: 'shear_photos' })
export class ShearPhoto {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'shear_id', type: 'uuid' })
  shearId: string;

  @Column({ name: 'content_type', type: 'varchar', length: 20 })
  contentType: PhotoContentType;

  @Column({ name: 'byte_size', type: 'integer' })
  byteSize: number;

  @Column({ type: 'integer' })
  width: number;

  @Column({ type: 'integer' })
  height: number;

  /** Taken while the shear was on this ticket line, before or after the work. */
  @Column({ name: 'ticket_line_id', type: 'uuid', nullable: true })
  ticketLineId: string | null;

  @Column({ type: 'varchar', length: 8, nullable: true })
  stage: PhotoStage | null;

  @Column({ name: 'uploaded_by', type: 'uuid', nullable: true })
  uploadedBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
