import { CreateUsersAndTokens1764633600000 } from './1764633600000-CreateUsersAndTokens';
import { CreateRateCards1764720000000 } from './1764720000000-CreateRateCards';
import { CreateRegistry1764806400000 } from './1764806400000-CreateRegistry';
import { CreateCsvImports1764806400001 } from './1764806400001-CreateCsvImports';
import { CreateRouteDays1764892800000 } from './1764892800000-CreateRouteDays';
import { CreateBookings1764979200000 } from './1764979200000-CreateBookings';
import { CreateTickets1764979200001 } from './1764979200001-CreateTickets';
import { CreateInvoices1765065600000 } from './1765065600000-CreateInvoices';
import { AddReportIndexes1765152000000 } from './1765152000000-AddReportIndexes';
import { CreateAuditEntries1765238400000 } from './1765238400000-CreateAuditEntries';
import { AddTicketShearCount1765324800000 } from './1765324800000-AddTicketShearCount';
import { CreateRateLimitHits1765411200000 } from './1765411200000-CreateRateLimitHits';
import { CreateMailOutbox1765501200000 } from './1765501200000-CreateMailOutbox';
import { AddShearListIndexes1765587600000 } from './1765587600000-AddShearListIndexes';
import { AddAuditTruncateGuard1765674000000 } from './1765674000000-AddAuditTruncateGuard';

/** Listed explicitly, oldest first, so the CLI, the app and jest load the same migrations without globs. */
export const migrations = [
  CreateUsersAndTokens1764633600000,
  CreateRateCards1764720000000,
  CreateRegistry1764806400000,
  CreateCsvImports1764806400001,
  CreateRouteDays1764892800000,
  CreateBookings1764979200000,
  CreateTickets1764979200001,
  CreateInvoices1765065600000,
  AddReportIndexes1765152000000,
  CreateAuditEntries1765238400000,
  AddTicketShearCount1765324800000,
  CreateRateLimitHits1765411200000,
  CreateMailOutbox1765501200000,
  AddShearListIndexes1765587600000,
  AddAuditTruncateGuard1765674000000,
];
