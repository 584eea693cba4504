/** Where a shear stands: in service, retired by its owner, or lost. */
export const SHEAR_STATUSES = ['in-service', 'retired', 'lost'] as const;
export type ShearStatus = (typeof SHEAR_STATUSES)[number];

export const SHEAR_STATUS_LABELS: Readonly<Record<ShearStatus, string>> = {
  'in-service': 'in service',
  retired: 'retired',
  lost: 'lost',
};

export const isShearStatus = (value: unknown): value is ShearStatus =>
  typeof value === 'string' && (SHEAR_STATUSES as readonly string[]).includes(value);
