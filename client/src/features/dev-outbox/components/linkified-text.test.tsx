import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { LinkifiedText } from './linkified-text';

describe('linkified text', () => {
  it('makes links clickable and leaves sentence punctuation outside them', () => {
    renderWithProviders(
      <p>
        <LinkifiedText text={'Set your password: http://127.0.0.1:3000/set-password?token=ab_c-1. Then sign in.'} />
      </p>,
    );
    const link = screen.getByRole('link');
    expect(link).toHaveAttribute('href', 'http://127.0.0.1:3000/set-password?token=ab_c-1');
    expect(screen.getByText(/Then sign in\./)).toBeInTheDocument();
  });

  it('never turns text into markup', () => {
    const { container } = renderWithProviders(<LinkifiedText text={'<b>bold</b> javascript:alert(1)'} />);
    expect(container.querySelector('b')).toBeNull();
    expect(screen.queryByRole('link')).toBeNull();
  });
});
