import type { EntityManager } from 'typeorm';
import { Customer } from '../customers/entities/customer.entity';
import { Stop } from '../stops/entities/stop.entity';
import { addressLines, type Payer } from './invoice-payer';

export interface BillToSnapshot {
  billToName: string;
  billToEmail: string | null;
  billToAddress: string;
}

/**
 * Who the invoice is to, as it prints: taken when the draft is made and again when it is issued, so a later rename
 * or move does not change a sent invoice. A customer has no postal address of their own in Keenroute: the stop where
 * they are met stands in ("c/o" the salon), which is where the sharpener hands the paper invoice over.
 */
export async function billToSnapshot(manager: EntityManager, payer: Payer): Promise<BillToSnapshot> {
  if (payer.billTo === 'stop') {
    const stop = await manager.getRepository(Stop).findOneByOrFail({ id: payer.stopId! });
    return {
      billToName: stop.name,
      billToEmail: stop.email,
      billToAddress: addressLines(stop).join('\n').slice(0, 500),
    };
  }
  const customer = await manager.getRepository(Customer).findOneByOrFail({ id: payer.customerId! });
  const stop = customer.stopId ? await manager.getRepository(Stop).findOneBy({ id: customer.stopId }) : null;
  return {
    billToName: customer.name,
    billToEmail: customer.email,
    billToAddress: stop ? [`c/o ${stop.name}`, ...addressLines(stop)].join('\n').slice(0, 500) : '',
  };
}
