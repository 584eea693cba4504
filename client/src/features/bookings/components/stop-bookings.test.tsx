import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { StopBookings } from './stop-bookings';

describe('the drop-offs under a day sheet stop', () => {
  it('shows who booked, a phone link to call them, the shears expected and their notes', () => {
    renderWithProviders(
      <StopBookings
        bookings={[
          {
            id: 'b-1',
            name: 'Jordan Clipper',
            phone: '(541) 555-0134',
            email: 'jordan@paws.test',
            notes: 'Left at the front desk.',
            status: 'booked',
            items: [
              { toolKind: 'straight', edgeType: 'convex', count: 2 },
              { toolKind: 'thinning', edgeType: 'beveled', count: 1 },
            ],
            benchMinutes: 45,
          },
        ]}
      />,
    );
    const item = within(screen.getByRole('listitem'));
    expect(item.getByText('Jordan Clipper')).toBeInTheDocument();
    expect(item.getByRole('link', { name: '(541) 555-0134' })).toHaveAttribute('href', 'tel:5415550134');
    expect(
      item.getByText('3 pairs: 2 × convex straight shear, 1 × beveled thinning shear · about 45 min'),
    ).toBeInTheDocument();
    expect(item.getByText('Left at the front desk.')).toBeInTheDocument();
    expect(item.getByText('Booked')).toBeInTheDocument();
  });

  it('says so when nobody booked', () => {
    renderWithProviders(<StopBookings bookings={[]} />);
    expect(screen.getByText('No drop-offs booked for this stop.')).toBeInTheDocument();
  });
});
