// The pay page notes what was paid before the checkout, so the page the checkout returns to can tell a new payment
// from an older part-payment. Session storage: it lives in this tab only and may be missing (another device, a
// private window), so a missing note just means waiting for "paid".

const key = (token: string) => `keenroute.pay.${token}.paid-before`;

export function rememberPaidBefore(token: string, paidCents: number): void {
  try {
    window.sessionStorage.setItem(key(token), String(paidCents));
  } catch {
    // Storage refused (full or blocked): the done page falls back to waiting for "paid".
  }
}

export function recallPaidBefore(token: string): number | null {
  try {
    const stored = window.sessionStorage.getItem(key(token));
    if (stored === null || !/^\d+$/.test(stored)) return null;
    return Number(stored);
  } catch {
    return null;
  }
}
