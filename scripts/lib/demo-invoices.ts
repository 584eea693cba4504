import { SetupError } from './setup-error.js';

interface Page<T> {
  items: T[];
  total: number;
}
interface StopRow {
  id: string;
  name: string;
  billingMode: 'customer' | 'stop';
}
interface CustomerRow {
  id: string;
  name: string;
  stop: { id: string } | null;
}
interface ShearRow {
  id: string;
  tagCode: string;
}
interface TicketRow {
  id: string;
  lines: { id: string }[];
}
interface ReadyGroup {
  customerId: string | null;
  tickets: { id: string }[];
}
interface InvoiceRow {
  id: string;
  balanceCents: number;
}

/** A small client for the demo's API calls: signs in once, then every call must succeed or setup stops. */
async function signIn(origin: string, email: string) {
  const login = await fetch(`${origin}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: 'keenroute-demo' }),
  });
  if (!login.ok) return null;
  const { accessToken } = (await login.json()) as { accessToken: string };
  const headers = { authorization: `Bearer ${accessToken}`, 'content-type': 'application/json' };
  return async function call<T>(method: string, path: string, body?: unknown): Promise<T> {
    const response = await fetch(`${origin}/api${path}`, {
      method,
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    if (!response.ok) {
      throw new SetupError(`Demo invoices: ${method} ${path} answered ${response.status}: ${await response.text()}`);
    }
    return (response.status === 204 ? undefined : await response.json()) as T;
  };
}

/**
 * The demo's billing: the office works a few of today's shears as visits (up to three pairs per customer), leaves
 * them for an invoice, and makes invoices of some: one left as a draft, one part-paid in cash, one paid by cheque, and
 * the demo groomer's sent by e-mail. The rest stay under "New invoice". Through the API, as the office would; skipped
 * while a draft or a ticket ready to invoice is there (the seeded history, all issued and settled, leaves neither).
 * Everything here is the invented Larkhaven scenario.
 */
export async function invoiceDemoTickets(origin: string): Promise<void> {
  const call = await signIn(origin, 'office@demo.keenroute.test');
  if (!call) return console.log('The demo office could not sign in (password changed?): no demo invoices.');
  if ((await call<Page<unknown>>('GET', '/invoices?status=draft&pageSize=1')).total > 0) return;
  if ((await call<ReadyGroup[]>('GET', '/invoices/ready')).length > 0) return;
  console.log('Making the demo invoices (tickets worked today, then billed)…');

  const stops = (await call<Page<StopRow>>('GET', '/stops?pageSize=100')).items;
  const chosen = [
    ...stops.filter((stop) => stop.billingMode === 'customer').slice(0, 2),
    ...stops.filter((stop) => stop.billingMode === 'stop').slice(0, 1),
  ];
  for (const stop of chosen) {
    const customers = (await call<Page<CustomerRow>>('GET', `/customers?stopId=${stop.id}&pageSize=3`)).items;
    for (const customer of customers) await workTicket(call, stop.id, customer.id);
  }
  // The demo groomer's own record, so client@demo.keenroute.test has an invoice to open and pay under My invoices.
  const [jo] = (await call<Page<CustomerRow>>('GET', '/customers?q=Jo%20Marlow&pageSize=1')).items;
  if (jo?.stop) await workTicket(call, jo.stop.id, jo.id);

  const groups = await call<ReadyGroup[]>('GET', '/invoices/ready');
  const joGroup = groups.find((group) => group.customerId === jo?.id);
  const others = groups.filter((group) => group !== joGroup);
  const invoices: InvoiceRow[] = [];
  for (const group of [...others.slice(0, 3), ...(joGroup ? [joGroup] : others.slice(3, 4))]) {
    invoices.push(await call<InvoiceRow>('POST', '/invoices', { ticketIds: group.tickets.map((ticket) => ticket.id) }));
  }
  const [, partPaid, paid, toSend] = invoices;
  if (toSend) await call('POST', `/invoices/${toSend.id}/send`, {});
  if (partPaid) {
    const issued = await call<InvoiceRow>('POST', `/invoices/${partPaid.id}/issue`);
    const amountCents = Math.max(1, Math.floor(issued.balanceCents / 2));
    await call('POST', `/invoices/${partPaid.id}/payments`, { method: 'cash', amountCents });
  }
  if (paid) {
    const issued = await call<InvoiceRow>('POST', `/invoices/${paid.id}/issue`);
    await call('POST', `/invoices/${paid.id}/payments`, {
      method: 'cheque',
      amountCents: issued.balanceCents,
      reference: '1042',
    });
  }
}

type Call = NonNullable<Awaited<ReturnType<typeof signIn>>>;

/** One customer's pairs through the bench: opened, each pair worked to ready, finished, left for an invoice. */
async function workTicket(call: Call, stopId: string, customerId: string): Promise<void> {
  const shears = (await call<Page<ShearRow>>('GET', `/shears?customerId=${customerId}&status=in-service&pageSize=3`))
    .items;
  if (shears.length === 0) return;
  let ticket = await call<TicketRow>('POST', '/tickets', { customerId, stopId, kind: 'visit' });
  for (const shear of shears) {
    ticket = await call<TicketRow>('POST', `/tickets/${ticket.id}/lines`, { tagCode: shear.tagCode });
  }
  for (const line of ticket.lines) {
    for (const benchStatus of ['on-the-bench', 'ready']) {
      await call('PATCH', `/tickets/${ticket.id}/lines/${line.id}`, { benchStatus });
    }
  }
  await call('POST', `/tickets/${ticket.id}/finish`);
  await call('POST', `/tickets/${ticket.id}/settle`, { settlement: 'to-invoice' });
}
