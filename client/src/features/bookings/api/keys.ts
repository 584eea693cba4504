export const bookingKeys = {
  all: ['bookings'] as const,
  publicStops: (q: string) => ['bookings', 'public-stops', q] as const,
  publicStop: (stopId: string) => ['bookings', 'public-stop', stopId] as const,
  quote: (input: unknown) => ['bookings', 'quote', input] as const,
  managed: (token: string) => ['bookings', 'managed', token] as const,
  staffList: (filters: unknown) => ['bookings', 'staff', filters] as const,
};
