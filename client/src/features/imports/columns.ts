import {
  BILLING_MODES,
  DEFAULT_CADENCE_WEEKS,
  EDGE_TYPES,
  HANDEDNESS,
  SHEAR_USES,
  STOP_KINDS,
  TAX_RATE_MAX_BP,
  TOOL_KINDS,
} from '@keenroute/shared';
import type { ImportKind } from './types';

export interface ColumnHelp {
  name: string;
  required?: boolean;
  help: string;
}

export interface KindHelp {
  label: string;
  /** The records one row makes, for counts: "3 stops". */
  noun: { one: string; many: string };
  summary: string;
  columns: ColumnHelp[];
}

const list = (values: readonly string[]) => values.join(', ');
const cadences = STOP_KINDS.map((kind) => `${kind} ${DEFAULT_CADENCE_WEEKS[kind]}`).join(', ');

/** What each file's columns hold, in the words the page shows; the server checks the same rules. */
export const IMPORT_HELP: Readonly<Record<ImportKind, KindHelp>> = {
  stops: {
    label: 'Stops',
    noun: { one: 'stop', many: 'stops' },
    summary:
      'One row per place on the route. A stop with the same name, street, city and postal code as another row or as a stop already in Keenroute is refused.',
    columns: [
      { name: 'name', required: true, help: 'The shop’s name, as customers know it.' },
      { name: 'kind', required: true, help: list(STOP_KINDS) },
      { name: 'street', required: true, help: 'House number and street.' },
      { name: 'city', required: true, help: 'City or town.' },
      { name: 'region', help: 'State or region.' },
      { name: 'postal_code', help: 'ZIP or postal code.' },
      { name: 'country', help: 'Two-letter code; US when empty.' },
      { name: 'phone', help: 'The shop’s phone.' },
      { name: 'email', help: 'The shop’s e-mail.' },
      { name: 'cadence_weeks', help: `Weeks between visits, 1 to 52; when empty, by kind: ${cadences}.` },
      { name: 'billing_mode', help: `${list(BILLING_MODES)}: who pays; customer when empty.` },
      {
        name: 'tax_rate_bp',
        help: `Sales tax in basis points, 0 to ${TAX_RATE_MAX_BP} (825 = 8.25 %); check your local tax rules.`,
      },
      { name: 'latitude', help: 'With longitude, places the pin; leave both empty to place it later.' },
      { name: 'longitude', help: 'With latitude.' },
      { name: 'access_parking', help: 'Where to park.' },
      { name: 'access_door', help: 'Which door to use.' },
      { name: 'access_best_time', help: 'When the visit suits the shop best.' },
    ],
  },
  customers: {
    label: 'Customers',
    noun: { one: 'customer', many: 'customers' },
    summary:
      'One row per stylist, groomer or student. The stop is found by its name (and street, when two stops share a name); an e-mail already used in the file or in Keenroute is refused.',
    columns: [
      { name: 'name', required: true, help: 'The customer’s full name.' },
      { name: 'email', help: 'Their e-mail; shear files find the customer by it.' },
      { name: 'phone', help: 'Their phone.' },
      { name: 'stop_name', help: 'The stop where they work, as named in Keenroute; empty for mail-in customers.' },
      { name: 'stop_street', help: 'The stop’s street, when two stops share the name.' },
      { name: 'notes', help: 'Anything worth knowing.' },
      { name: 'visit_notice_consent', help: 'yes or no: may Keenroute e-mail them visit notices; no when empty.' },
    ],
  },
  shears: {
    label: 'Shears',
    noun: { one: 'shear', many: 'shears' },
    summary:
      'One row per pair. The customer is found by e-mail, so import the customers first; each shear gets a new tag code to print on its label.',
    columns: [
      { name: 'customer_email', required: true, help: 'The owner’s e-mail, as in Keenroute.' },
      { name: 'make', help: 'Maker’s name.' },
      { name: 'model', help: 'Model name or number.' },
      { name: 'length_in', required: true, help: 'Length in inches, in quarter inches: 5.5, 6, 6.25…' },
      { name: 'edge_type', required: true, help: `${list(EDGE_TYPES)} (micro-serrated counts as serrated)` },
      { name: 'tool_kind', required: true, help: list(TOOL_KINDS) },
      { name: 'handedness', help: `${list(HANDEDNESS)}; right when empty.` },
      { name: 'use', help: `${list(SHEAR_USES)}; hair when empty.` },
      { name: 'notes', help: 'Nicks, repairs, anything the bench should know.' },
    ],
  },
};

export const countOf = (kind: ImportKind, count: number): string =>
  `${count.toLocaleString('en-US')} ${count === 1 ? IMPORT_HELP[kind].noun.one : IMPORT_HELP[kind].noun.many}`;
