import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { TicketAccess } from '../access/ticket-access';
import type { Actor } from '../auth/actor';
import { notFound } from '../common/errors/domain-error';
import { ShearPhoto, type PhotoStage } from '../shears/entities/shear-photo.entity';
import { ShearPhotosService, type UploadedPhoto } from '../shears/shear-photos.service';
import type { TicketDto } from './dto/ticket-response.dto';
import { TicketLine } from './entities/ticket-line.entity';
import { TicketReader } from './ticket-reader';

/** Before and after photos of a pair on a ticket: stored as the shear's photos, tagged with the line and stage. */
@Injectable()
export class TicketPhotosService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: TicketAccess,
    private readonly photos: ShearPhotosService,
    private readonly reader: TicketReader,
  ) {}

  async add(
    actor: Actor,
    ticketId: string,
    lineId: string,
    stage: PhotoStage,
    upload: UploadedPhoto | undefined,
  ): Promise<TicketDto> {
    await this.access.requireTicket(actor, ticketId, 'work');
    const line = await this.dataSource.getRepository(TicketLine).findOneBy({ id: lineId, ticketId });
    if (!line) throw notFound('The ticket line');
    const photo = await this.photos.add(actor, line.shearId, upload);
    await this.dataSource.getRepository(ShearPhoto).update(photo.id, { ticketLineId: line.id, stage });
    return this.reader.detail(ticketId);
  }
}
