import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi, type MockRequest } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { detail, saved, staffList } from '../testing/stop-fixtures';
import type { StopInput } from '../types';
import { StopCreateRoute } from './stop-create';
import { StopEditRoute } from './stop-edit';

function renderForm(route = '/stops/new') {
  return renderWithProviders(
    <>
      <Routes>
        <Route path="/stops/new" element={<StopCreateRoute />} />
        <Route path="/stops/:stopId/edit" element={<StopEditRoute />} />
        <Route path="/stops/:stopId" element={<p>Stop page</p>} />
      </Routes>
      <LocationProbe />
    </>,
    { route },
  );
}

type User = ReturnType<typeof renderForm>['user'];

// Pasting and label queries keep the big form's tests quick: typing re-renders it once per letter, and role
// queries walk the whole accessibility tree.
async function enter(user: User, label: RegExp, text: string) {
  const input = screen.getByLabelText(label);
  await user.clear(input);
  await user.click(input);
  await user.paste(text);
}

async function fillPlace(user: User) {
  await enter(user, /^Name/, 'Maple Street Salon');
  await enter(user, /^Street address/, '12 Maple Street');
  await enter(user, /^City/, 'Riverton');
}

// The whole form renders in each test, which takes a few seconds in jsdom.
describe('the stop form', { timeout: 60_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });

  it('sends the tax rate as basis points and shows a server field error on its field', async () => {
    const server = mockApi({
      'GET /api/users': staffList,
      'POST /api/stops': {
        status: 409,
        body: {
          statusCode: 409,
          message: 'A stop with this name and address exists.',
          fields: { name: ['A stop with this name and address exists.'] },
        },
      },
    });
    const { user } = renderForm();
    await fillPlace(user);
    await enter(user, /^Tax rate/, '8.25');
    await user.click(screen.getByText('Add the stop'));

    await waitFor(() => expect(server.callsTo('POST', '/api/stops')).toHaveLength(1));
    const body = server.callsTo('POST', '/api/stops')[0]?.body as StopInput;
    expect(body.taxRateBp).toBe(825);
    expect(body).toMatchObject({
      name: 'Maple Street Salon',
      kind: 'salon',
      cadenceWeeks: 8,
      street: '12 Maple Street',
    });
    expect(body.latitude).toBeUndefined();

    const name = screen.getByLabelText(/^Name/);
    await waitFor(() => expect(name).toHaveAttribute('aria-invalid', 'true'));
    expect(name).toHaveAccessibleDescription('A stop with this name and address exists.');
    expect(screen.getByText('The stop was not saved')).toBeInTheDocument();
    expect(screen.getByTestId('location')).toHaveTextContent('/stops/new');
  });

  it('follows the kind with the usual cadence until it is set by hand', async () => {
    mockApi({ 'GET /api/users': staffList });
    const { user } = renderForm();
    const cadence = screen.getByLabelText(/^Cadence in weeks/);
    expect(cadence).toHaveValue('8');
    await user.click(screen.getByRole('combobox', { name: /^Kind/ }));
    await user.click(await screen.findByRole('option', { name: 'Grooming shop' }));
    expect(cadence).toHaveValue('5');
    expect(screen.getByText('Usual for a grooming shop: every 5 weeks.')).toBeInTheDocument();
  });

  it('saves an ambiguous address, shows the candidates and saves the picked one', async () => {
    const candidates = [
      { label: '12 Maple Street, Riverton (north)', latitude: 45.51, longitude: -122.61 },
      { label: '12 Maple Street, Riverton (south)', latitude: 45.42, longitude: -122.63 },
    ];
    const server = mockApi({
      'GET /api/users': staffList,
      'POST /api/stops': {
        status: 201,
        body: saved(
          { status: 'ambiguous', message: 'The address matches 2 places.', candidates },
          { latitude: null, longitude: null, geocodeStatus: 'ambiguous' },
        ),
      },
      'PATCH /api/stops/s-maple': (request: MockRequest) => {
        const input = request.body as StopInput;
        return {
          status: 200,
          body: saved(
            { status: 'picked' },
            { latitude: input.latitude ?? null, longitude: input.longitude ?? null, geocodeStatus: 'picked' },
          ),
        };
      },
    });
    const { user } = renderForm();
    await fillPlace(user);
    await user.click(screen.getByText('Add the stop'));

    await waitFor(() => expect(server.callsTo('POST', '/api/stops')).toHaveLength(1));
    const alert = await screen.findByText('Pick the right place', {}, { timeout: 5000 });
    expect(screen.getByTestId('location')).toHaveTextContent('/stops/s-maple/edit');
    const box = alert.closest<HTMLElement>('[role="alert"]') ?? document.body;
    expect(
      within(box).getByText(/The stop is saved without a pin\. The address matches 2 places\./),
    ).toBeInTheDocument();
    await user.click(within(box).getByRole('radio', { name: /\(south\)/ }));
    await user.click(within(box).getByRole('button', { name: 'Save with this pin' }));

    await waitFor(() => expect(server.callsTo('PATCH', '/api/stops/s-maple')).toHaveLength(1));
    expect(server.callsTo('PATCH', '/api/stops/s-maple')[0]?.body).toMatchObject({
      latitude: 45.42,
      longitude: -122.63,
      geocodeChoice: 'picked',
    });
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent(/^\/stops\/s-maple$/));
  });

  it('geocodes a changed address again and, when that fails, takes typed coordinates', async () => {
    const patches: StopInput[] = [];
    const server = mockApi({
      'GET /api/users': staffList,
      'GET /api/stops/s-maple': { status: 200, body: detail() },
      'PATCH /api/stops/s-maple': (request: MockRequest) => {
        const input = request.body as StopInput;
        patches.push(input);
        return patches.length === 1
          ? {
              status: 200,
              body: saved(
                { status: 'failed', message: 'The geocoder did not answer.' },
                { street: input.street, latitude: null, longitude: null, geocodeStatus: 'failed' },
              ),
            }
          : { status: 200, body: saved({ status: 'manual' }, { geocodeStatus: 'manual' }) };
      },
    });
    const { user } = renderForm('/stops/s-maple/edit');
    await screen.findByLabelText(/^Street address/);
    await enter(user, /^Street address/, '99 Oak Avenue');
    await user.click(screen.getByLabelText('Tuesday open'));
    await user.click(screen.getByText('Save the stop'));

    await waitFor(() => expect(patches).toHaveLength(1));
    expect(patches[0]).toMatchObject({ street: '99 Oak Avenue', taxRateBp: 825 });
    expect(patches[0]).not.toHaveProperty('latitude');
    expect(patches[0]?.openingHours).toEqual({
      mon: [{ opens: '09:00', closes: '17:00' }],
      tue: [{ opens: '09:00', closes: '17:00' }],
      sat: [{ opens: '10:00', closes: '14:00' }],
    });

    expect(await screen.findByText('The stop is saved without a pin')).toBeInTheDocument();
    expect(
      screen.getByText(/The geocoder did not answer\. Place the pin by entering its coordinates/),
    ).toBeInTheDocument();
    await enter(user, /^Latitude/, '45.52345');
    await enter(user, /^Longitude/, '-122.67621');
    await user.click(screen.getByText('Save the stop'));

    await waitFor(() => expect(patches).toHaveLength(2));
    expect(patches[1]).toMatchObject({ latitude: 45.52345, longitude: -122.67621 });
    expect(patches[1]).not.toHaveProperty('geocodeChoice');
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent(/^\/stops\/s-maple$/));
    expect(server.callsTo('GET', '/api/stops/s-maple')).toHaveLength(1);
  });

  it('makes a client account the shop manager, asking the server for client accounts only', async () => {
    const server = mockApi({
      'GET /api/users': (request: MockRequest) =>
        request.search.get('roles') === 'client'
          ? {
              status: 200,
              body: {
                items: [
                  {
                    id: 'u-rin',
                    name: 'Rin Manager',
                    email: 'rin@demo.keenroute.test',
                    role: 'client',
                    status: 'active',
                  },
                ],
                total: 1,
              },
            }
          : staffList,
      'GET /api/stops/s-maple': { status: 200, body: detail() },
      'PATCH /api/stops/s-maple': { status: 200, body: saved({ status: 'unchanged' }) },
    });
    const { user } = renderForm('/stops/s-maple/edit');
    await user.click(await screen.findByRole('combobox', { name: /^Shop manager/ }));
    await user.click(await screen.findByRole('option', { name: 'Rin Manager' }));
    await user.click(screen.getByText('Save the stop'));

    await waitFor(() => expect(server.callsTo('PATCH', '/api/stops/s-maple')).toHaveLength(1));
    expect(server.callsTo('PATCH', '/api/stops/s-maple')[0]?.body).toMatchObject({ managerUserId: 'u-rin' });
    const rolesAsked = server.callsTo('GET', '/api/users').map((call) => call.search.get('roles'));
    expect(rolesAsked).toEqual(expect.arrayContaining(['client', 'sharpener,owner']));
  });

  it('finds the address on the map before saving and sends the picked pin', async () => {
    const server = mockApi({
      'GET /api/users': staffList,
      'GET /api/geocoding/search': {
        status: 200,
        body: {
          status: 'found',
          message: null,
          candidates: [{ label: '12 Maple Street, Riverton', latitude: 45.51, longitude: -122.61 }],
        },
      },
      'POST /api/stops': { status: 201, body: saved({ status: 'picked' }, { geocodeStatus: 'picked' }) },
    });
    const { user } = renderForm();
    await fillPlace(user);
    await user.click(screen.getByText('Find on map'));
    await user.click(await screen.findByText('12 Maple Street, Riverton'));
    expect(server.callsTo('GET', '/api/geocoding/search')[0]?.search.get('q')).toBe('12 Maple Street, Riverton, US');
    expect(screen.getByText('Pin at 45.51, -122.61 (picked: 12 Maple Street, Riverton).')).toBeInTheDocument();
    await user.click(screen.getByText('Add the stop'));

    await waitFor(() => expect(server.callsTo('POST', '/api/stops')).toHaveLength(1));
    expect(server.callsTo('POST', '/api/stops')[0]?.body).toMatchObject({
      latitude: 45.51,
      longitude: -122.61,
      geocodeChoice: 'picked',
    });
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent(/^\/stops\/s-maple$/));
  });
});
