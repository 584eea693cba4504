import { screen, waitFor, within } from '@testing-library/react';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { settings } from '../testing/fixtures';
import { PlanningSettingsSection } from './settings-form';

async function renderSettings(canEdit: boolean) {
  const rendered = renderWithProviders(<PlanningSettingsSection canEdit={canEdit} />);
  const form = within(await screen.findByRole('form', { name: 'Planning settings' }));
  return { ...rendered, form };
}

describe('the planning settings', { timeout: 60_000 }, () => {
  beforeEach(() => {
    signInAs('owner');
  });

  it('says clearly what is wrong and sends nothing until it is right', async () => {
    const server = mockApi({ 'GET /api/route-days/settings': { status: 200, body: settings() } });
    const { user, form } = await renderSettings(true);

    const replace = async (name: string, text: string) => {
      const field = form.getByRole('textbox', { name });
      await user.clear(field);
      if (text) await user.type(field, text);
    };
    await replace('Day starts', '8.30');
    await replace('Latest finish', '07:00');
    await replace('Road circuity', '2.5');
    await replace('Average speed (km/h)', '200');
    await replace('Notice to stops (days)', '40');
    await user.click(form.getByRole('checkbox', { name: 'Monday' }));
    await user.click(form.getByRole('button', { name: 'Save settings' }));

    expect(
      await form.findByText('Enter the start of the day as HH:MM on a 24-hour clock, like 08:30.'),
    ).toBeInTheDocument();
    expect(form.getByText('The road circuity is from 1 to 2 (road km per straight-line km).')).toBeInTheDocument();
    expect(form.getByText('The average speed is from 5 to 130 km/h.')).toBeInTheDocument();
    expect(form.getByText('The notice is from 0 to 28 days.')).toBeInTheDocument();
    expect(server.callsTo('PUT', '/api/route-days/settings')).toHaveLength(0);

    await replace('Day starts', '07:45');
    await user.click(form.getByRole('button', { name: 'Save settings' }));
    expect(await form.findByText('The latest finish must be after the start of the day.')).toBeInTheDocument();
    expect(server.callsTo('PUT', '/api/route-days/settings')).toHaveLength(0);
  });

  it('sends times as minutes after midnight', async () => {
    const server = mockApi({
      'GET /api/route-days/settings': { status: 200, body: settings() },
      'PUT /api/route-days/settings': (request) => ({ status: 200, body: request.body }),
    });
    const { user, form } = await renderSettings(true);
    const start = form.getByRole('textbox', { name: 'Day starts' });
    await user.clear(start);
    await user.type(start, '07:45');
    const circuity = form.getByRole('textbox', { name: 'Road circuity' });
    await user.clear(circuity);
    await user.type(circuity, '1.25');
    await user.click(form.getByRole('checkbox', { name: 'Saturday' }));
    await user.click(form.getByRole('button', { name: 'Save settings' }));

    await waitFor(() => expect(server.callsTo('PUT', '/api/route-days/settings')).toHaveLength(1));
    expect(server.callsTo('PUT', '/api/route-days/settings')[0]?.body).toEqual(
      settings({ shiftStart: 7 * 60 + 45, circuity: 1.25, workWeekdays: ['mon', 'tue', 'wed', 'thu', 'fri', 'sat'] }),
    );
    expect(await screen.findByText('Planning settings saved')).toBeInTheDocument();
  });

  it('lets the office read the settings but not change them', async () => {
    signInAs('office');
    mockApi({ 'GET /api/route-days/settings': { status: 200, body: settings() } });
    const { form } = await renderSettings(false);
    expect(form.getByRole('textbox', { name: 'Latest finish' })).toHaveValue('17:00');
    expect(form.getByRole('textbox', { name: 'Latest finish' })).toBeDisabled();
    expect(form.queryByRole('button', { name: 'Save settings' })).not.toBeInTheDocument();
  });
});
