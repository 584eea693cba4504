import type { CustomerSummary } from '@/features/customers/types';
import type { ShearSummary } from '@/features/shears/types';
import type { Ref } from './types';

export interface CustomerGroup {
  customer: Ref;
  /** The customer's own record from the list; missing when only their shears were loaded. */
  summary: CustomerSummary | null;
  shears: ShearSummary[];
}

/** The stop's shears under their customers, in the customers' order; customers with no shears are kept. */
export function groupShearsByCustomer(customers: CustomerSummary[], shears: ShearSummary[]): CustomerGroup[] {
  const groups = new Map<string, CustomerGroup>();
  for (const customer of customers) {
    groups.set(customer.id, { customer: { id: customer.id, name: customer.name }, summary: customer, shears: [] });
  }
  for (const shear of shears) {
    const group = groups.get(shear.customer.id);
    if (group) group.shears.push(shear);
    else groups.set(shear.customer.id, { customer: shear.customer, summary: null, shears: [shear] });
  }
  for (const group of groups.values()) group.shears.sort((a, b) => a.tagCode.localeCompare(b.tagCode));
  return [...groups.values()];
}
