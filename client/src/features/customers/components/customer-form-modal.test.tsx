import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { customersQueryKey } from '../api/get-customers';
import { customerMira, miraDetail, pageOf, stopPaws, stopRiverside } from '../testing/fixtures';
import { CustomerFormModal, type CustomerFormModalProps } from './customer-form-modal';

function renderModal(props: Partial<CustomerFormModalProps> = {}) {
  signInAs('office');
  const onClose = vi.fn();
  const onSaved = vi.fn();
  const rendered = renderWithProviders(<CustomerFormModal opened onClose={onClose} onSaved={onSaved} {...props} />);
  const dialog = within(screen.getByRole('dialog'));
  return { ...rendered, dialog, onClose, onSaved };
}

// Typing into Mantine inputs is slow in jsdom on a busy machine; these tests type a lot.
describe('the customer form', { timeout: 30_000 }, () => {
  it('asks for a name and a well-formed e-mail before sending', async () => {
    const server = mockApi({ 'GET /api/stops': pageOf([stopRiverside]) });
    const { user, dialog } = renderModal();
    await user.type(dialog.getByRole('textbox', { name: /e-mail/i }), 'not-an-address');
    await user.click(dialog.getByRole('button', { name: 'Add customer' }));
    expect(await dialog.findByText('Enter the customer’s name.')).toBeInTheDocument();
    expect(dialog.getByText(/enter an e-mail address/i)).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/customers')).toHaveLength(0);
  });

  it('shows an e-mail another customer has on the e-mail field', async () => {
    mockApi({
      'GET /api/stops': pageOf([stopRiverside]),
      'POST /api/customers': {
        status: 409,
        body: {
          statusCode: 409,
          message: 'Another customer already has that e-mail address.',
          fields: { email: ['Another customer already has that e-mail address.'] },
        },
      },
    });
    const { user, dialog, onClose } = renderModal();
    await user.type(dialog.getByRole('textbox', { name: /name/i }), 'Mira Again');
    await user.type(dialog.getByRole('textbox', { name: /e-mail/i }), 'mira@demo.keenroute.test');
    await user.click(dialog.getByRole('button', { name: 'Add customer' }));

    expect(await dialog.findByText('Another customer already has that e-mail address.')).toBeInTheDocument();
    expect(dialog.getByRole('textbox', { name: /e-mail/i })).toHaveAttribute('aria-invalid', 'true');
    expect(onClose).not.toHaveBeenCalled();
    // The form shows it; no notification repeats it.
    expect(screen.queryByText('Already there')).not.toBeInTheDocument();
  });

  it('puts a 409 without field details on the e-mail field too', async () => {
    mockApi({
      'GET /api/stops': pageOf([stopRiverside]),
      'POST /api/customers': { status: 409, body: { statusCode: 409, message: 'That e-mail is taken.' } },
    });
    const { user, dialog } = renderModal();
    await user.type(dialog.getByRole('textbox', { name: /name/i }), 'Mira Again');
    await user.type(dialog.getByRole('textbox', { name: /e-mail/i }), 'mira@demo.keenroute.test');
    await user.click(dialog.getByRole('button', { name: 'Add customer' }));
    expect(await dialog.findByText('That e-mail is taken.')).toBeInTheDocument();
  });

  it('starts at the stop it was given, picks another from the search and saves', async () => {
    const server = mockApi({
      'GET /api/stops': (request) =>
        request.search.get('q') === 'paws' ? pageOf([stopPaws]) : pageOf([stopRiverside, stopPaws]),
      'POST /api/customers': { status: 201, body: { ...miraDetail, id: 'c-new', name: 'Nia Shears' } },
    });
    const { user, dialog, onClose, onSaved, queryClient } = renderModal({ stopId: stopRiverside.id });
    const invalidate = vi.spyOn(queryClient, 'invalidateQueries');
    const stop = dialog.getByRole('combobox', { name: 'Stop' });
    await waitFor(() => expect(stop).toHaveValue('Riverside Cuts'));
    expect(server.callsTo('GET', '/api/stops')[0]?.search.get('pageSize')).toBe('20');

    await user.type(dialog.getByRole('textbox', { name: /name/i }), ' Nia Shears ');
    await user.clear(stop);
    await user.type(stop, 'paws');
    await waitFor(() => expect(server.callsTo('GET', '/api/stops').at(-1)?.search.get('q')).toBe('paws'));
    await user.click(await screen.findByRole('option', { name: /Paws & Tails Grooming/ }));
    await user.click(dialog.getByRole('checkbox', { name: /visit notices/i }));
    await user.click(dialog.getByRole('button', { name: 'Add customer' }));

    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(server.callsTo('POST', '/api/customers')[0]?.body).toEqual({
      name: 'Nia Shears',
      stopId: stopPaws.id,
      visitNoticeConsent: true,
    });
    expect(onSaved).toHaveBeenCalledWith(expect.objectContaining({ id: 'c-new' }));
    expect(invalidate).toHaveBeenCalledWith({ queryKey: customersQueryKey });
    expect(invalidate).toHaveBeenCalledWith({ queryKey: ['stops'] });
  });

  it('asks for the name of a preset stop that is not on the first page', async () => {
    mockApi({
      'GET /api/stops': pageOf([stopRiverside]),
      'GET /api/stops/s-paws': { status: 200, body: { ...stopPaws, kind: 'grooming-shop' } },
    });
    const { dialog } = renderModal({ stopId: stopPaws.id });
    await waitFor(() => expect(dialog.getByRole('combobox', { name: 'Stop' })).toHaveValue('Paws & Tails Grooming'));
  });

  it('edits a customer and sends only what changed', async () => {
    const server = mockApi({
      'GET /api/stops': pageOf([stopRiverside]),
      'PATCH /api/customers/c-mira': { status: 200, body: { ...miraDetail, phone: '555-0199' } },
    });
    const { user, dialog, onClose } = renderModal({ customer: miraDetail });
    expect(screen.getByRole('dialog', { name: 'Edit Mira Stylist' })).toBeInTheDocument();
    const phone = dialog.getByRole('textbox', { name: /phone/i });
    await user.clear(phone);
    await user.type(phone, '555-0199');
    await user.click(dialog.getByRole('button', { name: 'Save customer' }));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(server.callsTo('PATCH', '/api/customers/c-mira')[0]?.body).toEqual({ phone: '555-0199' });
  });

  it('loads the rest of a customer given from a list before editing', async () => {
    mockApi({
      'GET /api/stops': pageOf([stopRiverside]),
      'GET /api/customers/c-mira': { status: 200, body: miraDetail },
    });
    const { dialog } = renderModal({ customer: customerMira });
    expect(await dialog.findByRole('textbox', { name: /notes/i })).toHaveValue('Prefers mornings.');
  });
});
