import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export const PHOTO_CONTENT_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type PhotoContentType = (typeof PHOTO_CONTENT_TYPES)[number];

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

  @Column({ name: 'uploaded_by', type: 'uuid', nullable: true })
  uploadedBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
