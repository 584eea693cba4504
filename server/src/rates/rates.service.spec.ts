import { DEMO_RATE_CARD } from '@keenroute/shared';
import type { Repository } from 'typeorm';
import type { Actor } from '../auth/actor';
import type { RateCardVersion } from './entities/rate-card-version.entity';
import { RatesService } from './rates.service';

describe('RatesService', () => {
  const owner: Actor = { id: 'owner-1', email: 'o@x.test', name: 'Owner', role: 'owner' };
  const save = jest.fn((row: Partial<RateCardVersion>) => Promise.resolve({ ...row, version: 2 }));
  const repo = {
    create: (row: Partial<RateCardVersion>) => row,
    save,
    findOne: jest.fn().mockResolvedValue(null),
  } as unknown as Repository<RateCardVersion>;
  const sut = new RatesService(repo);

  it('saves a valid card as a new version by the actor', async () => {
    await expect(sut.save(owner, DEMO_RATE_CARD)).resolves.toMatchObject({ version: 2, createdBy: 'owner-1' });
  });

  it('reports every problem of a broken card under its field, and saves nothing', async () => {
    save.mockClear();
    const broken = { ...DEMO_RATE_CARD, tripChargeCents: -1, ticketMinimumCents: 1.5 };
    await expect(sut.save(owner, broken)).rejects.toMatchObject({
      code: 'invalid_input',
      fields: { 'card.tripChargeCents': expect.any(Array), 'card.ticketMinimumCents': expect.any(Array) },
    });
    expect(save).not.toHaveBeenCalled();
  });

  it('refuses a quote until a card is saved', async () => {
    await expect(sut.quote({ lines: [], taxRateBp: 0 })).rejects.toMatchObject({ code: 'conflict' });
  });
});
