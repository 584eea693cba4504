import type { ShearDetail, ShearSummary } from '../types';

// Invented demo shears for invented demo customers, as all Keenroute demo data is.
export const shearConvex: ShearSummary = {
  id: 'sh-123',
  tagCode: 'KR-000123',
  make: 'Demo Forge',
  model: 'Cobalt 65',
  lengthIn: 6.5,
  edgeType: 'convex',
  toolKind: 'straight',
  handedness: 'left',
  use: 'hair',
  status: 'in-service',
  customer: { id: 'c-mira', name: 'Mira Stylist' },
  stop: { id: 's-riverside', name: 'Riverside Cuts' },
  photoCount: 1,
  lastServicedOn: '2025-02-10',
};

export const shearThinner: ShearSummary = {
  id: 'sh-45',
  tagCode: 'KR-000045',
  make: null,
  model: null,
  lengthIn: 7,
  edgeType: 'beveled',
  toolKind: 'thinning',
  handedness: 'right',
  use: 'grooming',
  status: 'retired',
  customer: { id: 'c-teo', name: 'Teo Groomer' },
  stop: null,
  photoCount: 0,
  lastServicedOn: null,
};

export const convexDetail: ShearDetail = {
  ...shearConvex,
  notes: 'Dropped once; check the tip.',
  photos: [
    {
      id: 'p-1',
      contentType: 'image/jpeg',
      width: 1600,
      height: 1200,
      byteSize: 240_000,
      createdAt: '2025-02-10T10:00:00Z',
    },
  ],
  history: [
    { id: 'h-2', happenedOn: '2025-02-10', kind: 'serviced', summary: 'Sharpened on route at Riverside Cuts.' },
    { id: 'h-1', happenedOn: '2024-11-04', kind: 'registered', summary: 'Registered with tag KR-000123.' },
  ],
  createdAt: '2024-11-04T10:00:00Z',
  updatedAt: '2025-02-10T10:00:00Z',
};
