import { randomBytes } from 'node:crypto';

/**
 * The payment stand-in's Checkout Sessions: reading the service's form-encoded parameters, checking them the way the
 * service does (with its error shapes) and making session objects shaped like the real ones.
 */

export interface CheckoutSession {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer_details: { email: string | null } | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  metadata: Record<string, string>;
  mode: 'payment';
  payment_intent: string | null;
  payment_status: 'unpaid' | 'paid';
  status: 'open' | 'complete' | 'expired';
  success_url: string;
  url: string | null;
}

const SESSION_LIFETIME_S = 24 * 3600;
// The service allows expires_at from 30 minutes to 24 hours ahead (its Checkout Sessions API reference).
const MIN_EXPIRY_S = 30 * 60;
// Its documented minimum charge for USD is $0.50 and card amounts have at most 8 digits; elsewhere only > 0 is checked.
const USD_MINIMUM_CENTS = 50;
const MAX_AMOUNT = 99_999_999;
// What Keenroute sends, plus a few harmless presentation options; anything else is refused like the service does.
const KNOWN_PARAMS = new Set([
  'mode',
  'line_items',
  'success_url',
  'cancel_url',
  'customer_email',
  'client_reference_id',
  'metadata',
  'payment_intent_data',
  'expires_at',
  'expand',
  'payment_method_types',
  'locale',
  'submit_type',
]);

export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly param?: string,
    readonly code?: string,
  ) {
    super(message);
  }
}

export const invalid = (param: string, message: string) => new ApiError(400, message, param, 'parameter_invalid');

export type FormValue = string | FormValue[] | { [key: string]: FormValue };

/** Reads the service's form encoding (`line_items[0][price_data][unit_amount]=4830`) into nested objects and arrays. */
export function parseFormBody(body: string): Record<string, FormValue> {
  const root: Record<string, FormValue> = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const match = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(key);
    const path = match ? [match[1]!, ...[...match[2]!.matchAll(/\[([^[\]]*)\]/g)].map((m) => m[1]!)] : [];
    if (
      path.length === 0 ||
      path.some((part) => part === '' || ['__proto__', 'constructor', 'prototype'].includes(part))
    )
      throw invalid(key, `Could not read the parameter name "${key}": use name[key][0] brackets with a key or index.`);
    let node = root;
    for (const part of path.slice(0, -1)) {
      const next = Object.hasOwn(node, part) ? node[part] : (node[part] = {});
      if (typeof next !== 'object' || Array.isArray(next)) throw invalid(key, `"${key}" mixes a value and an object.`);
      node = next;
    }
    const last = path.at(-1)!;
    if (Object.hasOwn(node, last)) throw invalid(key, `"${key}" was sent twice or mixes a value and an object.`);
    node[last] = value;
  }
  return arraysFromIndexes(root) as Record<string, FormValue>;
}

function arraysFromIndexes(value: FormValue): FormValue {
  if (typeof value === 'string' || Array.isArray(value)) return value;
  const keys = Object.keys(value);
  const entries = keys.map((key) => [key, arraysFromIndexes(value[key]!)] as const);
  const isList = keys.length > 0 && keys.every((key) => /^\d+$/.test(key) && Number(key) < keys.length);
  return isList ? entries.sort((a, b) => Number(a[0]) - Number(b[0])).map(([, v]) => v) : Object.fromEntries(entries);
}

function text(value: FormValue | undefined, param: string, required: boolean): string | null {
  if (value === undefined || value === '') {
    if (required) throw new ApiError(400, `Missing required param: ${param}.`, param, 'parameter_missing');
    return null;
  }
  if (typeof value !== 'string') throw invalid(param, `Invalid ${param}: expected a string.`);
  return value;
}

function integer(value: FormValue | undefined, param: string, min: number, max: number): number {
  const raw = text(value, param, true)!;
  const n = Number(raw);
  if (!/^-?\d+$/.test(raw) || n < min || n > max)
    throw invalid(param, `Invalid ${param}: expected a whole number from ${min} to ${max}, got "${raw}".`);
  return n;
}

function url(value: FormValue | undefined, param: string, required: boolean): string | null {
  const raw = text(value, param, required);
  if (raw !== null && !URL.canParse(raw)) throw invalid(param, `Invalid URL for ${param}: "${raw}".`);
  return raw;
}

function stringMap(value: FormValue | undefined, param: string): Record<string, string> {
  if (value === undefined || value === '') return {};
  if (typeof value !== 'object' || Array.isArray(value)) throw invalid(param, `Invalid ${param}: expected key-values.`);
  const entries = Object.entries(value);
  if (entries.length > 50) throw invalid(param, `${param} holds at most 50 keys.`);
  return Object.fromEntries(entries.map(([key, v]) => [key, text(v, `${param}[${key}]`, false) ?? '']));
}

export interface LineItem {
  name: string;
  quantity: number;
  unitAmount: number;
  currency: string;
}

function lineItem(value: FormValue, param: string): LineItem {
  if (typeof value !== 'object' || Array.isArray(value)) throw invalid(param, `Invalid ${param}: expected an object.`);
  if (value.price !== undefined)
    throw invalid(`${param}[price]`, 'This stand-in knows no saved prices: send price_data with the amount instead.');
  const priceData = value.price_data;
  if (typeof priceData !== 'object' || Array.isArray(priceData))
    throw new ApiError(400, `Missing required param: ${param}[price_data].`, `${param}[price_data]`);
  const currency = text(priceData.currency, `${param}[price_data][currency]`, true)!;
  if (!/^[a-z]{3}$/.test(currency) || !Intl.supportedValuesOf('currency').includes(currency.toUpperCase()))
    throw invalid(`${param}[price_data][currency]`, `Invalid currency "${currency}": a lower-case ISO code like usd.`);
  const product = priceData.product_data;
  if (typeof product !== 'object' || Array.isArray(product))
    throw new ApiError(400, `Missing required param: ${param}[price_data][product_data].`);
  return {
    name: text(product.name, `${param}[price_data][product_data][name]`, true)!,
    quantity: integer(value.quantity, `${param}[quantity]`, 1, 999_999),
    unitAmount: integer(priceData.unit_amount, `${param}[price_data][unit_amount]`, 0, MAX_AMOUNT),
    currency,
  };
}

/** An amount in the currency's minor unit, as a person reads it: 4830 usd → "$48.30". */
export function formatAmount(minor: number, currency: string): string {
  const format = new Intl.NumberFormat('en-US', { style: 'currency', currency: currency.toUpperCase() });
  return format.format(minor / 10 ** (format.resolvedOptions().maximumFractionDigits ?? 2));
}

export interface Stored {
  session: CheckoutSession;
  lineItems: LineItem[];
}

export const now = () => Math.floor(Date.now() / 1000);
export const newId = (prefix: string) => `${prefix}${randomBytes(16).toString('hex')}`;

export function createSession(params: Record<string, FormValue>, pageBase: string): Stored {
  const unknown = Object.keys(params).find((key) => !KNOWN_PARAMS.has(key));
  if (unknown)
    throw invalid(unknown, `Received unknown parameter: ${unknown} (this stand-in speaks only what Keenroute uses).`);
  if (text(params.mode, 'mode', true) !== 'payment') throw invalid('mode', 'This stand-in supports mode=payment only.');
  const items = params.line_items;
  if (!Array.isArray(items) || items.length === 0)
    throw new ApiError(400, 'Missing required param: line_items (at least one line with price_data).', 'line_items');
  const lineItems = items.map((item, i) => lineItem(item, `line_items[${i}]`));
  const currency = lineItems[0]!.currency;
  if (lineItems.some((item) => item.currency !== currency))
    throw invalid('line_items', 'All line items of one checkout must use the same currency.');
  const total = lineItems.reduce((sum, item) => sum + item.unitAmount * item.quantity, 0);
  if (total < (currency === 'usd' ? USD_MINIMUM_CENTS : 1) || total > MAX_AMOUNT)
    throw invalid('line_items', `The total ${formatAmount(total, currency)} is outside what one checkout can charge.`);
  const created = now();
  const expiresAt =
    params.expires_at === undefined
      ? created + SESSION_LIFETIME_S
      : integer(params.expires_at, 'expires_at', created + MIN_EXPIRY_S, created + SESSION_LIFETIME_S);
  const intentData = params.payment_intent_data;
  if (intentData !== undefined && (typeof intentData !== 'object' || Array.isArray(intentData)))
    throw invalid('payment_intent_data', 'Invalid payment_intent_data: expected an object.');
  stringMap(intentData?.metadata, 'payment_intent_data[metadata]');
  const id = newId('cs_test_');
  return {
    lineItems,
    session: {
      id,
      object: 'checkout.session',
      amount_subtotal: total,
      amount_total: total,
      cancel_url: url(params.cancel_url, 'cancel_url', false),
      client_reference_id: text(params.client_reference_id, 'client_reference_id', false),
      created,
      currency,
      customer_details: null,
      customer_email: text(params.customer_email, 'customer_email', false),
      expires_at: expiresAt,
      livemode: false,
      metadata: stringMap(params.metadata, 'metadata'),
      mode: 'payment',
      payment_intent: null,
      payment_status: 'unpaid',
      status: 'open',
      success_url: url(params.success_url, 'success_url', true)!,
      url: `${pageBase}/checkout/${id}`,
    },
  };
}

export function withLineItems(stored: Stored, expand: FormValue | undefined): CheckoutSession {
  const wanted = Array.isArray(expand) ? expand : expand === undefined ? [] : [expand];
  if (!wanted.includes('line_items')) return stored.session;
  const data = stored.lineItems.map((item, i) => ({
    id: `li_${stored.session.id.slice(8, 24)}${i}`,
    object: 'item',
    amount_total: item.unitAmount * item.quantity,
    currency: item.currency,
    description: item.name,
    quantity: item.quantity,
  }));
  const list = { object: 'list', data, has_more: false, url: `/v1/checkout/sessions/${stored.session.id}/line_items` };
  return { ...stored.session, line_items: list } as CheckoutSession;
}
