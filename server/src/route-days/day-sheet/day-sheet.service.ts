import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { BENCH_CAUTIONS } from '@keenroute/shared';
import type { DataSource } from 'typeorm';
import type { Actor } from '../../auth/actor';
import { bookingsForSheet } from '../../bookings/day-sheet-bookings';
import { ExpectedBenchService } from '../planning/expected-bench';
import { RouteDaysService } from '../route-days.service';
import type { DaySheetDto, SheetCustomerDto } from './day-sheet.dto';
import { renderDaySheet } from './day-sheet-pdf';

interface StopContactRow {
  id: string;
  postal_code: string;
  phone: string | null;
  email: string | null;
  access_parking: string;
  access_door: string;
  access_best_time: string;
}

/** The day sheet: a route day's stops in order with what the sharpener needs at each door. */
@Injectable()
export class DaySheetService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly routeDays: RouteDaysService,
    private readonly expectedBench: ExpectedBenchService,
  ) {}

  async sheet(actor: Actor, id: string): Promise<DaySheetDto> {
    const routeDay = await this.routeDays.get(actor, id); // checks the actor may read the day
    const stopIds = routeDay.stops.map((s) => s.stopId);
    // Independent reads, each on its own pooled connection: one wait for the pool under load instead of four.
    const [contactRows, customers, bench, bookings] = await Promise.all([
      this.dataSource.query<StopContactRow[]>(
        `SELECT id, postal_code, phone, email, access_parking, access_door, access_best_time
           FROM stops WHERE id = ANY($1)`,
        [stopIds],
      ),
      this.customers(stopIds),
      this.expectedBench.forStops(stopIds),
      bookingsForSheet(this.dataSource.manager, id),
    ]);
    const contacts = new Map(contactRows.map((row) => [row.id, row]));
    return {
      routeDay,
      stops: routeDay.stops.map((stop) => {
        const contact = contacts.get(stop.stopId)!;
        return {
          position: stop.position,
          stopId: stop.stopId,
          name: stop.name,
          street: stop.street,
          city: stop.city,
          postalCode: contact.postal_code,
          phone: contact.phone,
          email: contact.email,
          accessParking: contact.access_parking,
          accessDoor: contact.access_door,
          accessBestTime: contact.access_best_time,
          arrival: stop.arrival,
          leave: stop.leave,
          arrivalWindow: stop.arrivalWindow,
          benchMinutes: stop.benchMinutes,
          expectedPairs: bench.get(stop.stopId)?.pairs ?? 0,
          customers: customers.get(stop.stopId) ?? [],
          bookings: bookings.get(stop.stopId) ?? [],
        };
      }),
      totals: {
        stops: routeDay.stops.length,
        distanceKm: routeDay.distanceKm,
        driveMinutes: routeDay.driveMinutes,
        benchMinutes: routeDay.benchMinutes,
        departure: routeDay.departure,
        finish: routeDay.finish,
      },
      cautions: [...BENCH_CAUTIONS],
    };
  }

  pdf(sheet: DaySheetDto): Promise<Buffer> {
    return renderDaySheet(sheet);
  }

  private async customers(stopIds: string[]): Promise<Map<string, SheetCustomerDto[]>> {
    const rows = await this.dataSource.query<(SheetCustomerDto & { stop_id: string })[]>(
      `SELECT c.id, c.name, c.phone, c.email, c.stop_id,
              (SELECT count(*)::int FROM shears s WHERE s.customer_id = c.id AND s.status = 'in-service') AS "shearCount"
         FROM customers c WHERE c.stop_id = ANY($1) AND c.active ORDER BY c.name`,
      [stopIds],
    );
    const byStop = new Map<string, SheetCustomerDto[]>();
    for (const { stop_id, ...customer } of rows) byStop.set(stop_id, [...(byStop.get(stop_id) ?? []), customer]);
    return byStop;
  }
}
