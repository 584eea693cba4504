import { formatAmount, type CheckoutSession, type Stored } from './stripe-sessions.js';

/** The payment stand-in's checkout page: plain HTML that works on a phone and says plainly that no money moves. */

const escapeHtml = (value: string) => value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export const successUrl = (session: CheckoutSession) =>
  session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id);

const PAGE_STYLE = `body{margin:0;font:17px/1.5 system-ui,sans-serif;background:#f3f4f6;color:#111827}
main{max-width:28rem;margin:0 auto;padding:1rem}.banner{background:#fef3c7;border:2px solid #b45309;border-radius:.5rem;padding:.75rem}
.card{background:#fff;border-radius:.75rem;padding:1rem;margin:1rem 0}ul{list-style:none;padding:0;margin:0}
li,.total{display:flex;justify-content:space-between;gap:1rem;padding:.4rem 0}.total{font-size:1.4rem;font-weight:700;border-top:1px solid #d1d5db}
button{display:block;width:100%;min-height:3.25rem;margin:.6rem 0;border:0;border-radius:.5rem;font-size:1.15rem;font-weight:600}
.pay{background:#1d4ed8;color:#fff}.decline{background:#e5e7eb;color:#111827}[role=alert]{background:#fee2e2;border:2px solid #b91c1c;border-radius:.5rem;padding:.75rem}
a{display:inline-block;padding:.75rem 0;color:#1d4ed8;font-size:1.05rem}.note{font-size:.95rem;color:#4b5563}`;

export function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1"><title>${escapeHtml(title)} — local payment stand-in</title>
<style>${PAGE_STYLE}</style></head><body><main>
<p class="banner"><strong>Local payment stand-in — no real money.</strong> This page runs on this machine in place of the
payment service; nothing is charged and no card is asked for.</p>
${body}</main></body></html>`;
}

export function checkoutPage(stored: Stored, declined: boolean): string {
  const { session, lineItems } = stored;
  const back = session.cancel_url ? `<a href="${escapeHtml(session.cancel_url)}">Back</a>` : '';
  if (session.status === 'expired')
    return page('Checkout expired', `<h1>This checkout has expired</h1><p>Nothing was charged.</p>${back}`);
  if (session.status === 'complete')
    return page(
      'Already paid',
      `<h1>Already paid</h1><p>This checkout was paid.</p><a href="${escapeHtml(successUrl(session))}">Continue</a>`,
    );
  const lines = lineItems
    .map(
      (item) =>
        `<li><span>${escapeHtml(item.name)}${item.quantity > 1 ? ` × ${item.quantity}` : ''}</span>` +
        `<span>${formatAmount(item.unitAmount * item.quantity, item.currency)}</span></li>`,
    )
    .join('');
  const total = formatAmount(session.amount_total, session.currency);
  return page(
    `Pay ${total}`,
    `<h1>Checkout</h1>
<section class="card" aria-label="What you pay for"><ul>${lines}</ul>
<p class="total"><span>Total</span><span>${total}</span></p>
${session.customer_email ? `<p>Receipt to ${escapeHtml(session.customer_email)}</p>` : ''}</section>
${declined ? '<p role="alert">Your card was declined (a stand-in test decline). Nothing was charged; the checkout is still open, so you can try again.</p>' : ''}
<form method="post" action="/checkout/${session.id}">
<button type="submit" name="action" value="pay" class="pay">Pay</button>
<button type="submit" name="action" value="decline" class="decline">Decline</button></form>
<p class="note">Test card: Pay acts as an accepted test card (the service's 4242 4242 4242 4242), Decline as a declined
one. ${total} is only pretend.</p>${back}`,
  );
}
