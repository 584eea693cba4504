/**
 * Larkhaven, the invented city of Keenroute's demo scenario: its streets and the addresses of its demo stops, with
 * coordinates. The demo seed places stops here and the local geocoder stand-in answers look-ups from the same list.
 * Everything here is made up for the demo; the coordinates sit on an invented grid, not on any real street.
 */
export interface DemoAddress {
  street: string;
  city: string;
  region: string;
  postalCode: string;
  country: string;
  latitude: number;
  longitude: number;
}

export const DEMO_CITY = 'Larkhaven';
export const DEMO_REGION = 'Lakeshore';
export const DEMO_COUNTRY = 'US';

/** The city centre of the invented grid. */
export const DEMO_CENTRE = { latitude: 44.8123, longitude: -92.4071 };

// Streets run east-west (a latitude each) or north-south (a longitude each); a house number moves along the street.
const STREETS: readonly { name: string; axis: 'ew' | 'ns'; offset: number; postalCode: string }[] = [
  { name: 'Alder Row', axis: 'ew', offset: 0.012, postalCode: '55901' },
  { name: 'Brassmill Road', axis: 'ew', offset: 0.004, postalCode: '55901' },
  { name: 'Cutler Street', axis: 'ew', offset: -0.006, postalCode: '55902' },
  { name: 'Dunmore Avenue', axis: 'ew', offset: -0.017, postalCode: '55903' },
  { name: 'Heron Lane', axis: 'ew', offset: 0.026, postalCode: '55904' },
  { name: 'Kestrel Way', axis: 'ns', offset: -0.021, postalCode: '55902' },
  { name: 'Millrace Drive', axis: 'ns', offset: -0.008, postalCode: '55901' },
  { name: 'Quarry Hill Road', axis: 'ns', offset: 0.007, postalCode: '55903' },
  { name: 'Tanner Boulevard', axis: 'ns', offset: 0.019, postalCode: '55904' },
  { name: 'Whetstone Place', axis: 'ns', offset: 0.033, postalCode: '55905' },
];

/** 100 house numbers are about 0.0025 degrees along the street. */
const DEGREES_PER_HUNDRED = 0.0025;

/** The address at a house number on one of Larkhaven's streets. */
export function demoAddress(streetIndex: number, houseNumber: number): DemoAddress {
  const street = STREETS[streetIndex % STREETS.length]!;
  const along = ((houseNumber - 500) / 100) * DEGREES_PER_HUNDRED;
  const latitude = street.axis === 'ew' ? DEMO_CENTRE.latitude + street.offset : DEMO_CENTRE.latitude + along;
  const longitude = street.axis === 'ns' ? DEMO_CENTRE.longitude + street.offset : DEMO_CENTRE.longitude + along;
  return {
    street: `${houseNumber} ${street.name}`,
    city: DEMO_CITY,
    region: DEMO_REGION,
    postalCode: street.postalCode,
    country: DEMO_COUNTRY,
    latitude: Math.round(latitude * 1e6) / 1e6,
    longitude: Math.round(longitude * 1e6) / 1e6,
  };
}

/** Every address the demo uses and the geocoder stand-in knows: 48 of them, spread over the ten streets. */
export const DEMO_ADDRESSES: readonly DemoAddress[] = Array.from({ length: 48 }, (_, i) =>
  demoAddress(i, 104 + ((i * 137) % 880)),
);

/** Street names only, for the stand-in's partial matches (a street with no number is ambiguous). */
export const DEMO_STREET_NAMES: readonly string[] = STREETS.map((street) => street.name);
