import type {
  CadenceReport,
  DriveCostReport,
  MonthsReport,
  ReceivablesReport,
  ReceivablesRow,
  StopFigures,
  StopRevenueRow,
  StopsReport,
} from '../types';

// Invented Larkhaven demo stops, people and money, as all Keenroute demo data is. The per-visit, per-hour and per-km
// figures are what the server would work out from each row's own totals (rounded to the cent).

export const RANGE = { from: '2025-01-01', to: '2025-12-31' };

export const stopRows = (): StopRevenueRow[] => [
  {
    stopId: 's-pine',
    stopName: 'Pine Street Salon (demo)',
    city: 'Larkhaven',
    cadenceWeeks: 8,
    visits: 6,
    shears: 54,
    revenueCents: 243000,
    benchMinutes: 720,
    driveMinutes: 180.5,
    routeMinutes: 900.5,
    km: 150.2,
    perVisitCents: 40500,
    perBenchHourCents: 20250,
    perRouteHourCents: 16191,
    perKmCents: 1618,
    shearsPerVisit: 9,
  },
  {
    stopId: 's-harbour',
    stopName: 'Harbour Groom Co. (demo)',
    city: 'Larkhaven',
    cadenceWeeks: 4,
    visits: 12,
    shears: 60,
    revenueCents: 198000,
    benchMinutes: 840,
    driveMinutes: 420,
    routeMinutes: 1260,
    km: 310.4,
    perVisitCents: 16500,
    perBenchHourCents: 14143,
    perRouteHourCents: 9429,
    perKmCents: 638,
    shearsPerVisit: 5,
  },
  {
    stopId: 's-birch',
    stopName: 'Birch Lane Barbers (demo)',
    city: 'North Larkhaven',
    cadenceWeeks: 6,
    visits: 3,
    shears: 12,
    revenueCents: 51000,
    benchMinutes: 150,
    driveMinutes: 95.2,
    routeMinutes: 245.2,
    km: 88.6,
    perVisitCents: 17000,
    perBenchHourCents: 20400,
    perRouteHourCents: 12480,
    perKmCents: 576,
    shearsPerVisit: 4,
  },
  {
    // On the books, not visited in the range: nothing to divide by.
    stopId: 's-quay',
    stopName: 'Quay Street Grooming School (demo)',
    city: 'Larkhaven',
    cadenceWeeks: 10,
    visits: 0,
    shears: 0,
    revenueCents: 0,
    benchMinutes: 0,
    driveMinutes: 0,
    routeMinutes: 0,
    km: 0,
    perVisitCents: null,
    perBenchHourCents: null,
    perRouteHourCents: null,
    perKmCents: null,
    shearsPerVisit: null,
  },
];

// 21 visits, 126 shears, $4,920.00 over 1710 bench minutes and 695.7 drive minutes (2405.7 route), 549.2 km.
export const stopTotals = (): StopFigures => ({
  visits: 21,
  shears: 126,
  revenueCents: 492000,
  benchMinutes: 1710,
  driveMinutes: 695.7,
  routeMinutes: 2405.7,
  km: 549.2,
  perVisitCents: 23429,
  perBenchHourCents: 17263,
  perRouteHourCents: 12271,
  perKmCents: 896,
  shearsPerVisit: 6,
});

export const stopsReport = (overrides: Partial<StopsReport> = {}): StopsReport => ({
  ...RANGE,
  sharpenerId: null,
  rows: stopRows(),
  totals: stopTotals(),
  ...overrides,
});

export const monthsReport = (overrides: Partial<MonthsReport> = {}): MonthsReport => ({
  ...RANGE,
  sharpenerId: null,
  rows: [
    {
      month: '2025-11',
      visits: 2,
      tickets: 9,
      shears: 18,
      revenueCents: 81000,
      perVisitCents: 40500,
      invoicedCents: null,
      collectedCents: null,
    },
    {
      month: '2025-12',
      visits: 0,
      tickets: 0,
      shears: 0,
      revenueCents: 0,
      perVisitCents: null,
      invoicedCents: null,
      collectedCents: null,
    },
  ],
  totals: {
    visits: 2,
    tickets: 9,
    shears: 18,
    revenueCents: 81000,
    perVisitCents: 40500,
    invoicedCents: null,
    collectedCents: null,
  },
  ...overrides,
});

const receivable = (row: Omit<ReceivablesRow, 'totalCents'>): ReceivablesRow => ({
  ...row,
  totalCents: row.currentCents + row.days1to30Cents + row.days31to60Cents + row.days61to90Cents + row.over90Cents,
});

/** Per bill-to party: a customer billed for themselves, or a stop that pays as a whole. */
export const receivablesByCustomer = (): ReceivablesReport => {
  const rows = [
    receivable({
      key: 'stop:s-pine',
      name: 'Pine Street Salon (demo)',
      stopName: 'Pine Street Salon (demo)',
      invoices: 3,
      currentCents: 9742,
      days1to30Cents: 12000,
      days31to60Cents: 0,
      days61to90Cents: 4500,
      over90Cents: 0,
    }),
    receivable({
      key: 'customer:c-mira',
      name: 'Mira Stylist (demo)',
      stopName: 'Birch Lane Barbers (demo)',
      invoices: 1,
      currentCents: 0,
      days1to30Cents: 0,
      days31to60Cents: 0,
      days61to90Cents: 0,
      over90Cents: 6230,
    }),
  ];
  return {
    ...RANGE,
    sharpenerId: null,
    asOf: RANGE.to,
    groupBy: 'customer',
    rows,
    totals: {
      invoices: 4,
      currentCents: 9742,
      days1to30Cents: 12000,
      days31to60Cents: 0,
      days61to90Cents: 4500,
      over90Cents: 6230,
      totalCents: 32472,
    },
  };
};

/** The same invoices per stop: Mira's invoice counts for the stop she works at. */
export const receivablesByStop = (): ReceivablesReport => ({
  ...receivablesByCustomer(),
  groupBy: 'stop',
  rows: [
    receivable({
      key: 's-pine',
      name: 'Pine Street Salon (demo)',
      stopName: null,
      invoices: 3,
      currentCents: 9742,
      days1to30Cents: 12000,
      days31to60Cents: 0,
      days61to90Cents: 4500,
      over90Cents: 0,
    }),
    receivable({
      key: 's-birch',
      name: 'Birch Lane Barbers (demo)',
      stopName: null,
      invoices: 1,
      currentCents: 0,
      days1to30Cents: 0,
      days31to60Cents: 0,
      days61to90Cents: 0,
      over90Cents: 6230,
    }),
  ],
});

export const driveCostReport = (overrides: Partial<DriveCostReport> = {}): DriveCostReport => ({
  ...RANGE,
  sharpenerId: null,
  medianPerRouteHourCents: 5820,
  rows: [
    {
      stopId: 's-harbour',
      stopName: 'Harbour Groom Co. (demo)',
      city: 'Larkhaven',
      cadenceWeeks: 4,
      visits: 12,
      revenueCents: 60000,
      routeMinutes: 1260,
      driveMinutes: 420,
      perRouteHourCents: 2857,
      // Best result first, as the server sorts them.
      suggestions: [
        { kind: 'trip-charge', tripChargeCents: 1700, perRouteHourCents: 3829 },
        {
          kind: 'longer-cadence',
          cadenceWeeks: 4,
          newCadenceWeeks: 8,
          driveMinutesSavedPerYear: 364,
          perRouteHourCents: 3429,
        },
        {
          kind: 'pair-with-neighbour',
          neighbourStopId: 's-pine',
          neighbourName: 'Pine Street Salon (demo)',
          distanceKm: 2.34,
          driveMinutesSavedPerVisit: 14.5,
          perRouteHourCents: 3337,
        },
      ],
    },
    {
      stopId: 's-birch',
      stopName: 'Birch Lane Barbers (demo)',
      city: 'North Larkhaven',
      cadenceWeeks: 6,
      visits: 3,
      revenueCents: 51000,
      routeMinutes: 245.2,
      driveMinutes: 95.2,
      perRouteHourCents: 12480,
      suggestions: [],
    },
  ],
  ...overrides,
});

export const cadenceReport = (overrides: Partial<CadenceReport> = {}): CadenceReport => ({
  ...RANGE,
  sharpenerId: null,
  graceDays: 7,
  rows: [
    {
      stopId: 's-harbour',
      stopName: 'Harbour Groom Co. (demo)',
      sharpenerId: 'u-sharpener',
      sharpenerName: 'Sasha Hone',
      cadenceWeeks: 4,
      visits: 12,
      onTime: 9,
      late: 2,
      averageGapDays: 30.4,
      worstLateDays: 12,
    },
  ],
  bySharpener: [{ sharpenerId: 'u-sharpener', sharpenerName: 'Sasha Hone', visits: 12, onTime: 9, late: 2 }],
  ...overrides,
});

/** GET /api/users as the sharpener picker reads it. */
export const staffPage = () => ({
  items: [
    { id: 'u-owner', name: 'Rowan Owner', role: 'owner', status: 'active' },
    { id: 'u-sharpener', name: 'Sasha Hone', role: 'sharpener', status: 'active' },
  ],
  total: 2,
});
