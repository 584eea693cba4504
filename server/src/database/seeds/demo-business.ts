import type { EntityManager } from 'typeorm';
import { BusinessProfile } from '../../invoices/entities/business-profile.entity';
import { DEMO_CITY, DEMO_COUNTRY, DEMO_REGION } from './demo-city';

/**
 * The invented demo business the invoices come from ("Larkhaven Shear Route"). Filled in only while the profile is
 * still blank, so an owner's own details are never overwritten. No logo: the owner uploads one on Business profile.
 */
export async function seedDemoBusinessProfile(manager: EntityManager): Promise<boolean> {
  const profiles = manager.getRepository(BusinessProfile);
  const profile = await profiles.findOneBy({ id: 1 });
  if (profile && profile.name !== '') return false;
  await profiles.save({
    id: 1,
    name: 'Larkhaven Shear Route (demo)',
    street: '14 Foundry Lane',
    city: DEMO_CITY,
    region: DEMO_REGION,
    postalCode: '55901',
    country: DEMO_COUNTRY,
    phone: '+1 555 0142',
    email: 'billing@demo.keenroute.test',
    website: '',
    taxId: 'DEMO-TX-0001',
    invoiceFooter:
      'Invented demo business for trying Keenroute. Thank you for sharpening with us: cheques payable to ' +
      'Larkhaven Shear Route (demo).',
    paymentTermsDays: 14,
    reminderDays: [7, 21, 45],
  });
  return true;
}
