/** Leaves Keenroute for the payment service's checkout page; its own module so tests can stand in for the browser. */
export function leaveForCheckout(url: string): void {
  window.location.assign(url);
}
