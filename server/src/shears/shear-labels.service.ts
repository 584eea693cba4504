import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { RegistryAccess } from '../access/registry-access';
import type { Actor } from '../auth/actor';
import { DomainError } from '../common/errors/domain-error';
import { INTER, INTER_BOLD } from '../common/pdf/fonts';
import { renderToBuffer } from '../common/pdf/render-to-buffer';
import type { AppConfig } from '../config/environment';
import { Customer } from '../customers/entities/customer.entity';
import { LABELS_MAX, type LabelsQueryDto } from './dto/labels-query.dto';
import { Shear } from './entities/shear.entity';
import { labelDescription, labelSlot, qrModuleRuns, SHEET, type LabelContent } from './label-sheet';
import { todayIn } from '../stops/business-today';

const PADDING = 6;
const QR_SIZE = SHEET.labelHeight - 2 * PADDING;

export interface LabelSheetFile {
  pdf: Buffer;
  fileName: string;
}

@Injectable()
export class ShearLabelsService {
  constructor(
    @InjectRepository(Shear) private readonly shears: Repository<Shear>,
    private readonly access: RegistryAccess,
    private readonly config: ConfigService<AppConfig, true>,
  ) {}

  async sheet(actor: Actor, query: LabelsQueryDto): Promise<LabelSheetFile> {
    const labels = await this.select(actor, query);
    const today = todayIn(this.config.get('BUSINESS_TIME_ZONE', { infer: true }));
    return { pdf: await renderLabels(labels), fileName: `keenroute-shear-labels-${today}.pdf` };
  }

  /** By ids: exactly those shears; by customer or stop: their shears in service (retired and lost ones need none). */
  private async select(actor: Actor, query: LabelsQueryDto): Promise<LabelContent[]> {
    if (!query.ids && !query.customerId && !query.stopId) {
      throw new DomainError('invalid_input', 'Choose the shears to label: ids, customerId or stopId.');
    }
    const builder = this.access
      .scopeShears(this.shears.createQueryBuilder('shear'), actor, 'shear')
      .innerJoin(Customer, 'customer', 'customer.id = shear.customerId')
      .addSelect('customer.name', 'customer_name');
    if (query.ids) builder.andWhere('shear.id IN (:...ids)', { ids: query.ids });
    if (query.customerId) builder.andWhere('shear.customerId = :customerId', { customerId: query.customerId });
    if (query.stopId) builder.andWhere('customer.stopId = :stopId', { stopId: query.stopId });
    if (!query.ids) builder.andWhere("shear.status = 'in-service'");
    const { entities, raw } = await builder
      .orderBy('customer.name', 'ASC')
      .addOrderBy('shear.tagCode', 'ASC')
      .limit(LABELS_MAX + 1)
      .getRawAndEntities<{ shear_id: string; customer_name: string }>();
    if (entities.length === 0) throw new DomainError('invalid_input', 'No shears match, so there is nothing to print.');
    if (entities.length > LABELS_MAX) {
      throw new DomainError('invalid_input', `At most ${LABELS_MAX} labels at a time; narrow the selection.`);
    }
    const names = new Map(raw.map((row) => [row.shear_id, row.customer_name]));
    return entities.map((shear) => ({
      tagCode: shear.tagCode,
      customerName: names.get(shear.id) ?? '',
      make: shear.make,
      model: shear.model,
      lengthIn: shear.lengthIn,
      toolKind: shear.toolKind,
    }));
  }
}

/** One label per shear: the QR code of its tag code, the code large, then the owner and the shear in small type. */
export function renderLabels(labels: LabelContent[]): Promise<Buffer> {
  const options = { size: 'LETTER', margin: 0, info: { Title: 'Shear labels', Creator: 'Keenroute' } } as const;
  const textX = PADDING + QR_SIZE + PADDING;
  const textWidth = SHEET.labelWidth - textX - PADDING;
  return renderToBuffer(options, (doc) => {
    labels.forEach((label, index) => {
      const slot = labelSlot(index);
      if (slot.page > 0 && index % (SHEET.columns * SHEET.rows) === 0) doc.addPage({ size: 'LETTER', margin: 0 });
      drawQrCode(doc, label.tagCode, slot.x + PADDING, slot.y + PADDING, QR_SIZE);
      const line = { width: textWidth, lineBreak: false, ellipsis: true } as const;
      doc
        .font(INTER_BOLD)
        .fontSize(15)
        .fillColor('#000000')
        .text(label.tagCode, slot.x + textX, slot.y + 10, line);
      doc
        .font(INTER)
        .fontSize(8)
        .text(label.customerName, slot.x + textX, slot.y + 33, line);
      doc
        .fontSize(7)
        .fillColor('#333333')
        .text(labelDescription(label), slot.x + textX, slot.y + 47, line);
    });
  });
}

/** Draws the QR code inside a square of the given size, keeping one module of white around it. */
function drawQrCode(doc: PDFKit.PDFDocument, text: string, x: number, y: number, size: number): void {
  const { size: modules, runs } = qrModuleRuns(text);
  const cell = size / (modules + 2);
  for (const run of runs) doc.rect(x + (run.column + 1) * cell, y + (run.row + 1) * cell, run.length * cell, cell);
  doc.fillColor('#000000').fill();
}
