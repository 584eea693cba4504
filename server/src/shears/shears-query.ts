import { normalizeTagCode } from '@keenroute/shared';
import type { ObjectLiteral, Repository, SelectQueryBuilder } from 'typeorm';
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

/**
 * The shears a list page picks from: joined to their customer only to sort by the customer's name. The filters read
 * the customer through subqueries, so a count or a page by tag code reads the shears' own indexes alone.
 */
export function shearListQuery(shears: Repository<Shear>, query: ListShearsQueryDto): SelectQueryBuilder<Shear> {
  const builder = shears.createQueryBuilder('shear');
  return query.sort === 'customer'
    ? builder.innerJoin(Customer, 'customer', 'customer.id = shear.customerId')
    : builder;
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

/**
 * Shears whose tag code, make, model or customer's name contains the text, as one id set: each part can use its
 * trigram index, where ORing them across the join made PostgreSQL test every shear with four ILIKEs.
 */
const TEXT_MATCH = `shear.id IN (
  SELECT matched.id FROM shears matched
   WHERE matched.tag_code ILIKE :like OR matched.make ILIKE :like OR matched.model ILIKE :like
  UNION
  SELECT owned.id FROM shears owned JOIN customers owner ON owner.id = owned.customer_id WHERE owner.name ILIKE :like)`;

const TAG_OR_TEXT_MATCH = TEXT_MATCH.replace(
  'WHERE matched.tag_code ILIKE',
  'WHERE matched.tag_code = :tag OR matched.tag_code ILIKE',
);

/** The list's filters and search; a search that reads as a tag code ("kr 12", "000012") also matches it exactly. */
export function filterShears<T extends ObjectLiteral>(
  builder: SelectQueryBuilder<T>,
  query: ListShearsQueryDto,
): SelectQueryBuilder<T> {
  const text = query.q?.trim();
  if (text) {
    const tag = normalizeTagCode(text);
    if (tag) {
      builder.andWhere(TAG_OR_TEXT_MATCH, { tag, like: likePattern(text) });
    } else {
      builder.andWhere(TEXT_MATCH, { like: likePattern(text) });
    }
  }
  if (query.customerId) builder.andWhere('shear.customerId = :customerId', { customerId: query.customerId });
  if (query.stopId) {
    builder.andWhere('shear.customerId IN (SELECT at_stop.id FROM customers at_stop WHERE at_stop.stop_id = :stopId)', {
      stopId: query.stopId,
    });
  }
  if (query.edgeType) builder.andWhere('shear.edgeType = :edgeType', { edgeType: query.edgeType });
  if (query.toolKind) builder.andWhere('shear.toolKind = :toolKind', { toolKind: query.toolKind });
  if (query.status) builder.andWhere('shear.status = :status', { status: query.status });
  return builder;
}

/** The chosen sort; a search by tag code puts the shear with exactly that code first. */
export function sortShears<T extends ObjectLiteral>(
  builder: SelectQueryBuilder<T>,
  query: ListShearsQueryDto,
): SelectQueryBuilder<T> {
  const tag = query.q ? normalizeTagCode(query.q) : undefined;
  if (tag) builder.addSelect('(shear.tag_code = :tag)', 'tag_exact').orderBy('tag_exact', 'DESC');
  const direction = query.order === 'desc' ? 'DESC' : 'ASC';
  builder.addOrderBy(SORT_COLUMNS[query.sort], direction);
  // TypeORM keys ORDER BY terms by column, so a tie-break on the sort column itself would overwrite its direction.
  // The tie-break runs the same way as the sort, so one (column, tag code) index serves a page in both directions.
  return query.sort === 'tagCode' ? builder : builder.addOrderBy('shear.tagCode', direction);
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
