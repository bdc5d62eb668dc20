import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { SessionUser } from '@shared/schemas/users';
import { DocumentsPanel } from '@/features/documents/components/documents-panel';
import type { DocumentView } from '@/features/documents/types';
import { apiError, mockFetch, planner, renderWithProviders } from './support';

const contractId = '00000000-0000-4000-8000-00000000c001';
const yardId = '00000000-0000-4000-8000-00000000e001';
const crew: SessionUser = { ...planner, id: planner.id.replace(/1$/, '2'), role: 'crew' };

const document = (name: string, overrides: Partial<DocumentView> = {}): DocumentView => ({
  id: `00000000-0000-4000-8000-${String(name.length).padStart(12, '0')}`,
  kind: 'contract',
  name,
  contentType: 'application/pdf',
  sizeBytes: 48_300,
  attachedKind: 'contract',
  attachedId: contractId,
  sharedWithGrower: true,
  downloadUrl: '',
  version: 1,
  archivedAt: null,
  createdAt: '2026-01-14T17:20:00.000Z',
  ...overrides,
});

const listed = [
  document('Pollination agreement 2026.pdf'),
  document('Block 12 map.kml', { kind: 'boundary', sharedWithGrower: false, sizeBytes: 900 }),
];

describe('DocumentsPanel', () => {
  it('when documents exist then each shows its name, kind, size, date, sharing and download link', async () => {
    mockFetch(() => ({ status: 200, body: { items: listed, total: 2 } }));
    renderWithProviders(<DocumentsPanel attachedKind="contract" attachedId={contractId} />);

    const table = await screen.findByRole('table', { name: 'Documents' });
    const agreement = within(table).getByRole('link', { name: 'Pollination agreement 2026.pdf' });
    expect(agreement.getAttribute('href')).toBe(`/api/documents/${listed[0].id}/download`);
    const row = agreement.closest('tr')!;
    expect(within(row).getByText('Shared')).toBeTruthy();
    expect(within(row).getByText('Contract')).toBeTruthy();
    expect(within(row).getByText('47 KB')).toBeTruthy();
    expect(within(row).getByText('Jan 14, 2026')).toBeTruthy();
    const map = within(table).getByRole('link', { name: 'Block 12 map.kml' }).closest('tr')!;
    expect(within(map).queryByText('Shared')).toBeNull();
    expect(within(map).getByText('900 B')).toBeTruthy();
  });

  it('when nothing is attached then the panel says so', async () => {
    mockFetch(() => ({ status: 200, body: { items: [], total: 0 } }));
    renderWithProviders(<DocumentsPanel attachedKind="yard" attachedId={yardId} />);
    expect(await screen.findByText('No documents yet.')).toBeTruthy();
  });

  it('when the planner uploads a file then FormData with the fields goes out with the CSRF header', async () => {
    const user = userEvent.setup();
    const { requests, fetchMock } = mockFetch((request) =>
      request.method === 'POST'
        ? { status: 201, body: document('signed.pdf') }
        : { status: 200, body: { items: [], total: 0 } },
    );
    renderWithProviders(<DocumentsPanel attachedKind="contract" attachedId={contractId} />);
    await screen.findByText('No documents yet.');

    const form = screen.getByRole('form', { name: 'Upload a document' });
    const file = new File(['%PDF-1.4 signed'], 'signed.pdf', { type: 'application/pdf' });
    await user.upload(within(form).getByLabelText('File'), file);
    await user.selectOptions(within(form).getByLabelText('Kind'), 'inspection-certificate');
    await user.click(within(form).getByRole('checkbox', { name: 'Share with the grower' }));
    await user.click(within(form).getByRole('button', { name: 'Upload' }));

    expect(await screen.findByText('Uploaded signed.pdf.')).toBeTruthy();
    const index = requests.findIndex((r) => r.method === 'POST');
    expect(requests[index].url).toBe('/api/documents');
    expect(requests[index].headers['X-CSRF-Token']).toBe('test-csrf-token');
    expect(requests[index].headers['Content-Type']).toBeUndefined();
    const body = fetchMock.mock.calls[index][1]?.body;
    expect(body).toBeInstanceOf(FormData);
    const sent = body as FormData;
    expect(sent.get('kind')).toBe('inspection-certificate');
    expect(sent.get('attachedKind')).toBe('contract');
    expect(sent.get('attachedId')).toBe(contractId);
    expect(sent.get('sharedWithGrower')).toBe('true');
    expect((sent.get('file') as File).name).toBe('signed.pdf');
  });

  it('when the server refuses the file type with 415 then our message says which types are accepted', async () => {
    const user = userEvent.setup();
    mockFetch((request) =>
      request.method === 'POST'
        ? apiError(
            415,
            'unsupported_media_type',
            'This file is not a PDF, PNG, JPEG, GeoJSON, JSON or KML file.',
          )
        : { status: 200, body: { items: [], total: 0 } },
    );
    renderWithProviders(<DocumentsPanel attachedKind="yard" attachedId={yardId} />);
    await screen.findByText('No documents yet.');

    const form = screen.getByRole('form', { name: 'Upload a document' });
    expect(within(form).queryByRole('checkbox', { name: 'Share with the grower' })).toBeNull();
    await user.upload(
      within(form).getByLabelText('File'),
      new File(['<html></html>'], 'notes.pdf', { type: 'application/pdf' }),
    );
    await user.click(within(form).getByRole('button', { name: 'Upload' }));

    const alert = await within(form).findByRole('alert');
    expect(alert.textContent).toContain(
      "This kind of file isn't accepted: PDF, PNG, JPEG, GeoJSON or KML",
    );
  });

  it('when the server answers 413 then the panel says the file is too large', async () => {
    const user = userEvent.setup();
    mockFetch((request) =>
      request.method === 'POST'
        ? apiError(413, 'payload_too_large', 'The file is larger than the upload limit.')
        : { status: 200, body: { items: [], total: 0 } },
    );
    renderWithProviders(<DocumentsPanel attachedKind="yard" attachedId={yardId} />);
    await screen.findByText('No documents yet.');
    const form = screen.getByRole('form', { name: 'Upload a document' });
    await user.upload(within(form).getByLabelText('File'), new File(['x'], 'big.pdf'));
    await user.click(within(form).getByRole('button', { name: 'Upload' }));
    expect((await within(form).findByRole('alert')).textContent).toContain(
      'Too large (limit 10 MB)',
    );
  });

  it('when crew look at the documents then they can download but not upload, share or archive', async () => {
    mockFetch(() => ({
      status: 200,
      body: { items: [document('Gate code photo.jpg', { attachedKind: 'yard' })], total: 1 },
    }));
    renderWithProviders(<DocumentsPanel attachedKind="yard" attachedId={yardId} />, {
      user: crew,
    });

    expect(await screen.findByRole('link', { name: 'Gate code photo.jpg' })).toBeTruthy();
    expect(screen.queryByRole('form', { name: 'Upload a document' })).toBeNull();
    expect(screen.queryByRole('button', { name: /Archive/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /Share/ })).toBeNull();
  });
});
