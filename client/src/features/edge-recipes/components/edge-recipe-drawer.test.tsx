import { screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { EdgeRecipeDrawer } from './edge-recipe-drawer';

describe('EdgeRecipeDrawer', () => {
  it('shows the steps, the inside-edge stone and the cautions of a convex shear with inside-edge work', async () => {
    renderWithProviders(
      <EdgeRecipeDrawer
        opened
        onClose={vi.fn()}
        insideEdge
        shear={{ edgeType: 'convex', toolKind: 'straight', lengthIn: 6.5, handedness: 'right' }}
      />,
    );
    const drawer = await screen.findByRole('dialog');
    // Discs 80 to 9 µm, then the paste pad, and a ~6000 grit stone: common practice defaults in the rules package.
    for (const grade of ['80 µm', '60 µm', '30 µm', '15 µm', '9 µm']) expect(drawer).toHaveTextContent(grade);
    expect(drawer).toHaveTextContent(/paste/i);
    expect(drawer).toHaveTextContent(/#6000/);
    expect(screen.getByText('Cautions at the bench')).toBeInTheDocument();
    expect(drawer).toHaveTextContent(/dust/i);
  });

  it('says a serrated edge keeps its serrations', async () => {
    renderWithProviders(
      <EdgeRecipeDrawer
        opened
        onClose={vi.fn()}
        shear={{ edgeType: 'serrated', toolKind: 'straight', lengthIn: 6, handedness: 'right' }}
      />,
    );
    expect(await screen.findByRole('dialog')).toHaveTextContent(/serration/i);
  });

  it('explains a shear the rules refuse instead of crashing', async () => {
    renderWithProviders(
      <EdgeRecipeDrawer
        opened
        onClose={vi.fn()}
        shear={{ edgeType: 'convex', toolKind: 'straight', lengthIn: 14, handedness: 'right' }}
      />,
    );
    expect(await screen.findByText('No recipe for this shear')).toBeInTheDocument();
  });
});
