import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { catchDownloads } from '@/testing/downloads';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import type { ImportPreview } from '../types';
import { ImportsRoute } from './imports';

const preview = (overrides: Partial<ImportPreview> = {}): ImportPreview => ({
  id: 'imp-1',
  kind: 'shears',
  fileName: 'shears.csv',
  rowCount: 3,
  validCount: 3,
  errors: [],
  sample: [
    { customer_email: 'robin@demo.keenroute.test', length_in: '6.5', edge_type: 'convex', tool_kind: 'straight' },
    { customer_email: 'sam@demo.keenroute.test', length_in: '7', edge_type: 'beveled', tool_kind: 'thinning' },
    { customer_email: 'sam@demo.keenroute.test', length_in: '5.5', edge_type: 'serrated', tool_kind: 'curved' },
  ],
  canCommit: true,
  ...overrides,
});

const csvFile = (name = 'shears.csv', text = 'customer_email,length_in,edge_type,tool_kind\n') =>
  new File([text], name, { type: 'text/csv' });

/** The FormData the page sent: the mock API sees only JSON bodies, so read it from the fetch call itself. */
function sentForm(): FormData {
  const calls = vi.mocked(fetch).mock.calls;
  const upload = calls.find(([, init]) => init?.body instanceof FormData);
  if (!upload) throw new Error('No multipart request was sent.');
  return upload[1]!.body as FormData;
}

function renderImports() {
  const result = renderWithProviders(
    <Routes>
      <Route
        path="/imports"
        element={
          <>
            <ImportsRoute />
            <LocationProbe />
          </>
        }
      />
      <Route path="*" element={<LocationProbe />} />
    </Routes>,
    { route: '/imports' },
  );
  const chooseKind = (label: string) => result.user.click(screen.getByRole('radio', { name: label }));
  const dropFile = (file: File) => result.user.upload(screen.getByLabelText('CSV file to import'), file);
  return { ...result, chooseKind, dropFile };
}

describe('the Import page', () => {
  beforeEach(() => {
    signInAs('office');
  });

  it('explains each kind of file and downloads its template with the session token', async () => {
    const server = mockApi({ 'GET /api/imports/templates/customers': { status: 200, body: 'name,email\r\n' } });
    const downloads = catchDownloads();
    const { chooseKind, user } = renderImports();

    expect(screen.getByRole('heading', { name: 'Stops file columns' })).toBeInTheDocument();
    expect(screen.getByText('access_best_time')).toBeInTheDocument();
    await chooseKind('Customers');
    expect(screen.getByRole('heading', { name: 'Customers file columns' })).toBeInTheDocument();
    expect(screen.getByText('visit_notice_consent')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Download the template' }));
    await waitFor(() => expect(downloads.names).toHaveLength(1));
    const [call] = server.callsTo('GET', '/api/imports/templates/customers');
    expect(call?.headers.get('Authorization')).toBe('Bearer token-office');
    expect(await downloads.blobs[0]!.text()).toContain('name,email');
    expect(downloads.names).toEqual(['keenroute-customers-template.csv']);
  });

  it('uploads the file with its kind and shows the problems by line, with no import button', async () => {
    mockApi({
      'POST /api/imports': {
        status: 201,
        body: preview({
          validCount: 1,
          canCommit: false,
          errors: [
            { row: 2, column: 'length_in', message: 'Shear length is measured in quarter inches; got 6.3.' },
            { row: 3, column: 'customer_email', message: 'No customer has the e-mail ghost@demo.keenroute.test.' },
            { row: 3, column: null, message: 'This row has fewer values than the header has columns.' },
          ],
        }),
      },
    });
    const { chooseKind, dropFile } = renderImports();
    await chooseKind('Shears');
    await dropFile(csvFile());

    expect(await screen.findByRole('heading', { name: 'Preview of shears.csv' })).toBeInTheDocument();
    const form = sentForm();
    expect(form.get('kind')).toBe('shears');
    expect((form.get('file') as File).name).toBe('shears.csv');

    const problems = within(screen.getByRole('table', { name: 'Problems by line' }));
    const lines = problems.getAllByRole('row').slice(1);
    expect(lines.map((line) => within(line).getAllByRole('cell')[0]!.textContent)).toEqual(['3', '4', '4']);
    expect(problems.getByText(/quarter inches/)).toBeInTheDocument();
    expect(problems.getByText('whole row')).toBeInTheDocument();
    expect(screen.getByText('With problems').nextSibling).toHaveTextContent('2');
    expect(screen.queryByRole('button', { name: /^Import/ })).not.toBeInTheDocument();
    expect(
      within(screen.getByRole('table', { name: 'The first rows of the file' })).getByText('beveled'),
    ).toBeVisible();
  });

  it('imports a good file and links to the list of what it made', async () => {
    const server = mockApi({
      'POST /api/imports': { status: 201, body: preview() },
      'POST /api/imports/imp-1/commit': { status: 200, body: { kind: 'shears', created: 3 } },
    });
    const { chooseKind, dropFile, user } = renderImports();
    await chooseKind('Shears');
    await dropFile(csvFile());
    expect(await screen.findByText(/No problems found/)).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Import 3 shears' }));
    expect(await screen.findByText('3 shears imported from shears.csv.', { exact: false })).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/imports/imp-1/commit')).toHaveLength(1);
    await user.click(screen.getByRole('link', { name: 'Open the Shears list' }));
    expect(screen.getByTestId('location')).toHaveTextContent('/shears');
  });

  it('shows the rows a refused commit names, and that nothing was imported', async () => {
    mockApi({
      'POST /api/imports': { status: 201, body: preview({ kind: 'customers', fileName: 'team.csv', rowCount: 2 }) },
      'POST /api/imports/imp-1/commit': {
        status: 400,
        body: {
          statusCode: 400,
          message: '1 of 2 rows has problems, so nothing was imported. Fix them in the file and upload it again.',
          fields: { 'rows.2.email': ['A customer with this e-mail is already in Keenroute.'] },
        },
      },
    });
    const { chooseKind, dropFile, user } = renderImports();
    await chooseKind('Customers');
    await dropFile(csvFile('team.csv'));
    await user.click(await screen.findByRole('button', { name: 'Import 2 customers' }));

    expect(await screen.findByText('Nothing was imported')).toBeInTheDocument();
    expect(screen.getByText(/1 of 2 rows has problems/)).toBeInTheDocument();
    const problems = within(screen.getByRole('table', { name: 'Problems by line' }));
    expect(problems.getByText('email')).toBeInTheDocument();
    expect(problems.getByText('3')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Import/ })).not.toBeInTheDocument();
  });

  it('says why the server refused the whole file, beside the drop zone', async () => {
    mockApi({
      'POST /api/imports': {
        status: 400,
        body: { statusCode: 400, message: 'This column is not part of a stops file: colour.' },
      },
    });
    const { dropFile } = renderImports();
    await dropFile(csvFile('stops.csv'));
    expect(await screen.findByText('The file could not be read')).toBeInTheDocument();
    expect(screen.getByText(/not part of a stops file: colour/)).toBeInTheDocument();
    // Shown once, on the page, not again as a notification.
    expect(screen.queryByText('That did not work')).not.toBeInTheDocument();
  });

  it('refuses a file over 5 MB or not a CSV before sending anything', async () => {
    const server = mockApi({});
    const { dropFile } = renderImports();
    await dropFile(new File([new Uint8Array(5 * 1024 * 1024 + 1)], 'big.csv', { type: 'text/csv' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('larger than 5 MB');
    expect(server.calls).toHaveLength(0);
  });
});
