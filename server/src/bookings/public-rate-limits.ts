/** Per address per minute on the public booking routes (Keenroute's own defaults): writes tighter than reads. */
export const PUBLIC_WRITES = { auth: { limit: 20, ttl: 60_000 } };
export const PUBLIC_READS = { auth: { limit: 60, ttl: 60_000 } };
