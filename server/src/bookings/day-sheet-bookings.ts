import type { EntityManager } from 'typeorm';
import type { SheetBookingDto } from './dto/booking-response.dto';
import { Booking } from './entities/booking.entity';

/** A route day's drop-offs per stop, for the day sheet: cancelled ones are left off. */
export async function bookingsForSheet(
  manager: EntityManager,
  routeDayId: string,
): Promise<Map<string, SheetBookingDto[]>> {
  const rows = await manager
    .getRepository(Booking)
    .createQueryBuilder('b')
    .leftJoinAndSelect('b.items', 'item')
    .where('b.routeDayId = :routeDayId', { routeDayId })
    .andWhere(`b.status <> 'cancelled'`)
    .orderBy('b.name')
    .addOrderBy('b.createdAt')
    .addOrderBy('item.position')
    .getMany();
  const byStop = new Map<string, SheetBookingDto[]>();
  for (const b of rows) {
    const entry: SheetBookingDto = {
      id: b.id,
      name: b.name,
      phone: b.phone,
      email: b.email,
      notes: b.notes,
      status: b.status,
      items: b.items.map((item) => ({ toolKind: item.toolKind, edgeType: item.edgeType, count: item.count })),
      benchMinutes: b.benchMinutes,
    };
    byStop.set(b.stopId, [...(byStop.get(b.stopId) ?? []), entry]);
  }
  return byStop;
}
