import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { customerMira, pageOf } from '@/features/customers/testing/fixtures';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { shearsQueryKey } from '../api/get-shears';
import { convexDetail } from '../testing/fixtures';
import { ShearFormModal, type ShearFormModalProps } from './shear-form-modal';

// The rules package's own wording for a length that is not a quarter-inch step.
const QUARTER_INCH_MESSAGE = 'Shear length is measured in quarter inches (like 6, 6.25, 6.5, 6.75); got 6.3.';

function renderModal(props: Partial<ShearFormModalProps> = {}) {
  signInAs('office');
  const onClose = vi.fn();
  const onSaved = vi.fn();
  const rendered = renderWithProviders(<ShearFormModal opened onClose={onClose} onSaved={onSaved} {...props} />);
  const dialog = within(screen.getByRole('dialog'));
  return { ...rendered, dialog, onClose, onSaved };
}

async function choose(user: ReturnType<typeof renderModal>['user'], field: HTMLElement, option: string | RegExp) {
  await user.click(field);
  await user.click(await screen.findByRole('option', { name: option }));
}

describe('the shear form', { timeout: 30_000 }, () => {
  it('asks for the length, edge type and tool kind before sending', async () => {
    const server = mockApi({});
    const { user, dialog } = renderModal({ customerId: 'c-mira' });
    await user.click(dialog.getByRole('button', { name: 'Register shear' }));
    expect(await dialog.findByText('Enter the length in inches.')).toBeInTheDocument();
    expect(dialog.getByText('Choose the edge type.')).toBeInTheDocument();
    expect(dialog.getByText('Choose the tool kind.')).toBeInTheDocument();
    expect(server.calls).toHaveLength(0);
  });

  it('shows the server’s refusal of a 6.3 in length on the length field', async () => {
    const server = mockApi({
      'POST /api/shears': {
        status: 400,
        body: { statusCode: 400, message: 'Some fields need attention.', fields: { lengthIn: [QUARTER_INCH_MESSAGE] } },
      },
    });
    const { user, dialog, onSaved } = renderModal({ customerId: 'c-mira' });
    await user.type(dialog.getByRole('textbox', { name: /length/i }), '6.3');
    await choose(user, dialog.getByRole('combobox', { name: /edge type/i }), 'Convex');
    await choose(user, dialog.getByRole('combobox', { name: /tool kind/i }), 'Straight shear');
    await user.click(dialog.getByRole('button', { name: 'Register shear' }));

    expect(await dialog.findByText(QUARTER_INCH_MESSAGE)).toBeInTheDocument();
    expect(dialog.getByRole('textbox', { name: /length/i })).toHaveAttribute('aria-invalid', 'true');
    expect(server.callsTo('POST', '/api/shears')[0]?.body).toMatchObject({ lengthIn: 6.3 });
    expect(onSaved).not.toHaveBeenCalled();
    expect(screen.queryByText('That did not work')).not.toBeInTheDocument();
  });

  it('registers a shear for a chosen customer and shows its new tag code', async () => {
    const server = mockApi({
      'GET /api/customers': pageOf([customerMira]),
      'POST /api/shears': { status: 201, body: { ...convexDetail, tagCode: 'KR-000124', id: 'sh-124' } },
    });
    const { user, dialog, onSaved, onClose, queryClient } = renderModal();
    const invalidate = vi.spyOn(queryClient, 'invalidateQueries');
    await choose(user, dialog.getByRole('combobox', { name: /customer/i }), /Mira Stylist/);
    await user.type(dialog.getByRole('textbox', { name: /^make/i }), 'Demo Forge');
    await user.type(dialog.getByRole('textbox', { name: /length/i }), '6.5');
    await choose(user, dialog.getByRole('combobox', { name: /edge type/i }), 'Convex');
    await choose(user, dialog.getByRole('combobox', { name: /tool kind/i }), 'Straight shear');
    await user.click(dialog.getByRole('radio', { name: 'Left-handed' }));
    await user.click(dialog.getByRole('button', { name: 'Register shear' }));

    expect(await dialog.findByLabelText('New tag code')).toHaveTextContent('KR-000124');
    expect(server.callsTo('POST', '/api/shears')[0]?.body).toEqual({
      customerId: 'c-mira',
      make: 'Demo Forge',
      lengthIn: 6.5,
      edgeType: 'convex',
      toolKind: 'straight',
      handedness: 'left',
      use: 'hair',
    });
    expect(onSaved).toHaveBeenCalledWith(expect.objectContaining({ tagCode: 'KR-000124' }));
    expect(invalidate).toHaveBeenCalledWith({ queryKey: shearsQueryKey });
    expect(onClose).not.toHaveBeenCalled();
    expect(dialog.getByRole('link', { name: 'Open the shear' })).toHaveAttribute('href', '/shears/sh-124');
  });

  it('edits a shear, status included, and sends only what changed', async () => {
    const server = mockApi({
      'PATCH /api/shears/sh-123': { status: 200, body: { ...convexDetail, status: 'retired' } },
    });
    const { user, dialog, onClose } = renderModal({ shear: convexDetail });
    expect(screen.getByRole('dialog', { name: 'Edit KR-000123' })).toBeInTheDocument();
    expect(dialog.queryByRole('combobox', { name: /customer/i })).not.toBeInTheDocument();
    await choose(user, dialog.getByRole('combobox', { name: /status/i }), 'Retired');
    await user.click(dialog.getByRole('button', { name: 'Save shear' }));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(server.callsTo('PATCH', '/api/shears/sh-123')[0]?.body).toEqual({ status: 'retired' });
  });
});
