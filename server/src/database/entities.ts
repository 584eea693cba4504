import { AuditEntry } from '../audit/entities/audit-entry.entity';
import { RefreshToken } from '../auth/entities/refresh-token.entity';
import { UserToken } from '../auth/entities/user-token.entity';
import { BookingItem } from '../bookings/entities/booking-item.entity';
import { Booking } from '../bookings/entities/booking.entity';
import { CustomerStopHistory } from '../customers/entities/customer-stop-history.entity';
import { Customer } from '../customers/entities/customer.entity';
import { BusinessProfile } from '../invoices/entities/business-profile.entity';
import { CreditNote } from '../invoices/entities/credit-note.entity';
import { InvoiceLine } from '../invoices/entities/invoice-line.entity';
import { InvoiceMail } from '../invoices/entities/invoice-mail.entity';
import { InvoiceReminder } from '../invoices/entities/invoice-reminder.entity';
import { Invoice } from '../invoices/entities/invoice.entity';
import { InvoiceCheckout } from '../payments/entities/invoice-checkout.entity';
import { PaymentEvent } from '../payments/entities/payment-event.entity';
import { CsvImport } from '../imports/entities/csv-import.entity';
import { CalendarFeed } from '../route-days/entities/calendar-feed.entity';
import { PlanningSettings } from '../route-days/entities/planning-settings.entity';
import { RouteDayStop } from '../route-days/entities/route-day-stop.entity';
import { RouteDay } from '../route-days/entities/route-day.entity';
import { RouteWeekPlan } from '../route-days/entities/route-week-plan.entity';
import { VisitNotice } from '../route-days/entities/visit-notice.entity';
import { RateCardVersion } from '../rates/entities/rate-card-version.entity';
import { ShearHistoryEntry } from '../shears/entities/shear-history-entry.entity';
import { ShearPhoto } from '../shears/entities/shear-photo.entity';
import { Shear } from '../shears/entities/shear.entity';
import { StopVisit } from '../stops/entities/stop-visit.entity';
import { Stop } from '../stops/entities/stop.entity';
import { TicketLineOverride } from '../tickets/entities/ticket-line-override.entity';
import { TicketLine } from '../tickets/entities/ticket-line.entity';
import { Ticket } from '../tickets/entities/ticket.entity';
import { OutboxMail } from '../mail/entities/outbox-mail.entity';
import { Payment } from '../payments/entities/payment.entity';
import { User } from '../users/entities/user.entity';

/** Every entity, for the CLI data source; the app registers them through each module's forFeature. */
export const entities = [
  User,
  RefreshToken,
  UserToken,
  RateCardVersion,
  Stop,
  StopVisit,
  Customer,
  CustomerStopHistory,
  Shear,
  ShearPhoto,
  ShearHistoryEntry,
  CsvImport,
  PlanningSettings,
  RouteDay,
  RouteDayStop,
  RouteWeekPlan,
  CalendarFeed,
  VisitNotice,
  Booking,
  BookingItem,
  Ticket,
  TicketLine,
  TicketLineOverride,
  Payment,
  BusinessProfile,
  Invoice,
  InvoiceLine,
  CreditNote,
  InvoiceReminder,
  InvoiceMail,
  InvoiceCheckout,
  PaymentEvent,
  AuditEntry,
  OutboxMail,
];
