import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { ApiError } from './api-error';
import { notifyError } from './notify-error';

describe('the global error notice', () => {
  it('shows the server message, with the request id for a server fault', async () => {
    renderWithProviders(<p>page</p>);
    notifyError(new ApiError(500, { message: 'The database did not answer.', requestId: 'req-7' }));
    expect(await screen.findByText('The database did not answer. (reference req-7)')).toBeInTheDocument();
    expect(screen.getByText('Server problem')).toBeInTheDocument();
  });

  it('stays quiet for a 401 and for errors the screen shows itself', async () => {
    renderWithProviders(<p>page</p>);
    notifyError(new ApiError(401, { message: 'Unauthorized' }));
    notifyError(new ApiError(409, { message: 'Already a user.' }), { handlesError: (error) => error.status === 409 });
    notifyError(new ApiError(403, { message: 'Only an owner may do that.' }));
    expect(await screen.findByText('Only an owner may do that.')).toBeInTheDocument();
    expect(screen.queryByText('Unauthorized')).not.toBeInTheDocument();
    expect(screen.queryByText('Already a user.')).not.toBeInTheDocument();
  });
});
