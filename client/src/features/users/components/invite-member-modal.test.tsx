import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { usersQueryKey } from '../api/get-users';
import { InviteMemberModal } from './invite-member-modal';

function renderInvite(actorRole: 'owner' | 'office', onClose = vi.fn()) {
  signInAs(actorRole);
  const rendered = renderWithProviders(<InviteMemberModal actorRole={actorRole} opened onClose={onClose} />);
  const dialog = within(screen.getByRole('dialog', { name: 'Invite someone to Keenroute' }));
  return { ...rendered, dialog, onClose };
}

describe('the invite form', () => {
  it('checks name, e-mail and role before sending', async () => {
    const server = mockApi({});
    const { user, dialog } = renderInvite('owner');
    await user.type(dialog.getByRole('textbox', { name: /e-mail/i }), 'not-an-address');
    await user.click(dialog.getByRole('button', { name: 'Send invitation' }));

    expect(await dialog.findByText('Enter the name they go by.')).toBeInTheDocument();
    expect(dialog.getByText(/enter an e-mail address/i)).toBeInTheDocument();
    expect(dialog.getByText('Choose what they will do in Keenroute.')).toBeInTheDocument();
    expect(server.calls).toHaveLength(0);
  });

  it('offers an office manager every role but owner', async () => {
    mockApi({});
    const { user, dialog } = renderInvite('office');
    await user.click(dialog.getByRole('combobox', { name: /role/i }));
    const options = (await screen.findAllByRole('option')).map((option) => option.textContent);
    expect(options).toEqual(['Office', 'Sharpener', 'Client']);
  });

  it('offers an owner every role', async () => {
    mockApi({});
    const { user, dialog } = renderInvite('owner');
    await user.click(dialog.getByRole('combobox', { name: /role/i }));
    const options = (await screen.findAllByRole('option')).map((option) => option.textContent);
    expect(options).toEqual(['Owner', 'Office', 'Sharpener', 'Client']);
  });

  it('shows an e-mail that is already a user on the e-mail field', async () => {
    mockApi({
      'POST /api/users/invitations': {
        status: 409,
        body: { statusCode: 409, message: 'That e-mail address already belongs to a user.' },
      },
    });
    const { user, dialog, onClose } = renderInvite('owner');
    await user.type(dialog.getByRole('textbox', { name: /name/i }), 'Sam Bevel');
    await user.type(dialog.getByRole('textbox', { name: /e-mail/i }), 'sam@demo.keenroute.test');
    await user.click(dialog.getByRole('combobox', { name: /role/i }));
    await user.click(await screen.findByRole('option', { name: 'Sharpener' }));
    await user.click(dialog.getByRole('button', { name: 'Send invitation' }));

    expect(await dialog.findByText('That e-mail address already belongs to a user.')).toBeInTheDocument();
    expect(dialog.getByRole('textbox', { name: /e-mail/i })).toHaveAttribute('aria-invalid', 'true');
    expect(onClose).not.toHaveBeenCalled();
  });

  it('sends the invitation, reloads the team list and closes', async () => {
    const server = mockApi({
      'POST /api/users/invitations': {
        status: 201,
        body: {
          id: 'u-new',
          email: 'sam@demo.keenroute.test',
          name: 'Sam Bevel',
          role: 'sharpener',
          status: 'invited',
          createdAt: '2025-03-01T10:00:00.000Z',
          lastSignInAt: null,
        },
      },
    });
    const { user, dialog, onClose, queryClient } = renderInvite('owner');
    const invalidate = vi.spyOn(queryClient, 'invalidateQueries');
    await user.type(dialog.getByRole('textbox', { name: /name/i }), '  Sam Bevel ');
    await user.type(dialog.getByRole('textbox', { name: /e-mail/i }), 'sam@demo.keenroute.test');
    await user.click(dialog.getByRole('combobox', { name: /role/i }));
    await user.click(await screen.findByRole('option', { name: 'Sharpener' }));
    await user.click(dialog.getByRole('button', { name: 'Send invitation' }));

    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(server.callsTo('POST', '/api/users/invitations')[0]?.body).toEqual({
      name: 'Sam Bevel',
      email: 'sam@demo.keenroute.test',
      role: 'sharpener',
    });
    expect(invalidate).toHaveBeenCalledWith({ queryKey: usersQueryKey });
    expect(await screen.findByText('Invitation sent')).toBeInTheDocument();
  });
});
