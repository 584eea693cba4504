import { normalizeTagCode } from '@keenroute/shared';
import type { Repository, SelectQueryBuilder } from 'typeorm';
import { likePattern } from '../common/pagination.dto';
import { refOrNull } from '../customers/dto/ref.dto';
import { Customer } from '../customers/entities/customer.entity';
import { Stop } from '../stops/entities/stop.entity';
import type { ListShearsQueryDto, ShearSort } from './dto/list-shears-query.dto';
import { toShearSummary, type ShearExtras, type ShearSummaryDto } from './dto/shear-response.dto';
import type { Shear } from './entities/shear.entity';

const PHOTO_COUNT = '(SELECT COUNT(*)::int FROM shear_photos counted WHERE counted.shear_id = shear.id)';
// to_char keeps the date a calendar date; a pg date parsed into a JS Date would pick up a time zone.
const LAST_SERVICED = `(SELECT to_char(MAX(serviced.happened_on), 'YYYY-MM-DD') FROM shear_history serviced
  WHERE serviced.shear_id = shear.id AND serviced.kind = 'serviced')`;

const SHARPENING_COUNT = `(SELECT COUNT(*)::int FROM shear_history sharpened
  WHERE sharpened.shear_id = shear.id AND sharpened.kind = 'serviced')`;

const SORT_COLUMNS: Record<ShearSort, string> = {
  tagCode: 'shear.tagCode',
  make: 'shear.make',
  lengthIn: 'shear.lengthIn',
  edgeType: 'shear.edgeType',
  customer: 'customer.name',
  createdAt: 'shear.createdAt',
};

interface SummaryRaw {
  shear_id: string;
  customer_name: string;
  stop_id: string | null;
  stop_name: string | null;
  photo_count: number;
  last_serviced_on: string | null;
  sharpening_count: number;
}

/** Shears with their customer, the customer's stop, photo count, last service date and times sharpened. */
export function shearSummaryQuery(shears: Repository<Shear>): SelectQueryBuilder<Shear> {
  return shears
    .createQueryBuilder('shear')
    .innerJoin(Customer, 'customer', 'customer.id = shear.customerId')
    .leftJoin(Stop, 'stop', 'stop.id = customer.stopId')
    .addSelect('customer.name', 'customer_name')
    .addSelect('stop.id', 'stop_id')
    .addSelect('stop.name', 'stop_name')
    .addSelect(PHOTO_COUNT, 'photo_count')
    .addSelect(LAST_SERVICED, 'last_serviced_on')
    .addSelect(SHARPENING_COUNT, 'sharpening_count');
}

/** The list's filters and search; a search that reads as a tag code ("kr 12", "000012") also matches it exactly. */
export function filterShears(builder: SelectQueryBuilder<Shear>, query: ListShearsQueryDto): SelectQueryBuilder<Shear> {
  const text = query.q?.trim();
  if (text) {
    const tag = normalizeTagCode(text);
    const fuzzy =
      'shear.tagCode ILIKE :like OR shear.make ILIKE :like OR shear.model ILIKE :like OR customer.name ILIKE :like';
    if (tag) {
      builder.andWhere(`(shear.tagCode = :tag OR ${fuzzy})`, { tag, like: likePattern(text) });
    } else {
      builder.andWhere(`(${fuzzy})`, { like: likePattern(text) });
    }
  }
  if (query.customerId) builder.andWhere('shear.customerId = :customerId', { customerId: query.customerId });
  if (query.stopId) builder.andWhere('customer.stopId = :stopId', { stopId: query.stopId });
  if (query.edgeType) builder.andWhere('shear.edgeType = :edgeType', { edgeType: query.edgeType });
  if (query.toolKind) builder.andWhere('shear.toolKind = :toolKind', { toolKind: query.toolKind });
  if (query.status) builder.andWhere('shear.status = :status', { status: query.status });
  return builder;
}

/** The chosen sort; a search by tag code puts the shear with exactly that code first. */
export function sortShears(builder: SelectQueryBuilder<Shear>, query: ListShearsQueryDto): SelectQueryBuilder<Shear> {
  const tag = query.q ? normalizeTagCode(query.q) : undefined;
  if (tag) builder.addSelect('(shear.tag_code = :tag)', 'tag_exact').orderBy('tag_exact', 'DESC');
  builder.addOrderBy(SORT_COLUMNS[query.sort], query.order === 'desc' ? 'DESC' : 'ASC');
  // TypeORM keys ORDER BY terms by column, so a tie-break on the sort column itself would overwrite its direction.
  return query.sort === 'tagCode' ? builder : builder.addOrderBy('shear.tagCode', 'ASC');
}

/** Runs a summary query; raw rows are matched to entities by id, not by position. */
export async function fetchShearRows(
  builder: SelectQueryBuilder<Shear>,
): Promise<{ shear: Shear; extras: ShearExtras }[]> {
  const { entities, raw } = await builder.getRawAndEntities<SummaryRaw>();
  const byId = new Map(raw.map((row) => [row.shear_id, row]));
  return entities.map((shear) => {
    const row = byId.get(shear.id);
    const extras: ShearExtras = {
      customer: { id: shear.customerId, name: row?.customer_name ?? '' },
      stop: refOrNull(row?.stop_id ?? null, row?.stop_name ?? null),
      photoCount: row?.photo_count ?? 0,
      lastServicedOn: row?.last_serviced_on ?? null,
      sharpeningCount: row?.sharpening_count ?? 0,
    };
    return { shear, extras };
  });
}

export async function fetchSummaries(builder: SelectQueryBuilder<Shear>): Promise<ShearSummaryDto[]> {
  return (await fetchShearRows(builder)).map(({ shear, extras }) => toShearSummary(shear, extras));
}
