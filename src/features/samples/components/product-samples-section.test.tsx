import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ProductDetail } from '@shared/contracts/products';
import type { ProductSamplesResponse, Sample } from '@shared/contracts/samples';
import { forgetCsrfToken } from '../../../lib/api-client';
import { fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { ProductSamplesSection } from './product-samples-section';

const productId = '0b8f3c1e-5d2a-4f6b-9c7e-1a2b3c4d5e6f';
const product = { id: productId, name: 'Puffin Picnic mug' } as ProductDetail;

const sample: Sample = {
  id: '7c1d2e3f-4a5b-4c6d-8e9f-0a1b2c3d4e5f',
  productId,
  orderedOn: '2026-02-03',
  printer: 'Harbour Print Co.',
  costMinor: 1250,
  currency: 'GBP',
  expectedOn: '2026-02-10',
  receivedOn: null,
  notes: '',
  verdict: 'pending',
  verdictNotes: '',
  verdictBy: null,
  verdictAt: null,
  createdBy: { id: 'user-ines', name: 'Ines Okafor' },
  createdAt: '2026-02-03T10:00:00.000Z',
  updatedAt: '2026-02-03T10:00:00.000Z',
  photos: [
    {
      id: 'photo-1',
      sampleId: '7c1d2e3f-4a5b-4c6d-8e9f-0a1b2c3d4e5f',
      fileName: 'mug-front.jpg',
      contentType: 'image/jpeg',
      byteSize: 2_400_000,
      width: 3000,
      height: 4000,
      thumbUrl: '/api/sample-photos/photo-1/thumb',
      displayUrl: '/api/sample-photos/photo-1/display',
      originalUrl: '/api/sample-photos/photo-1/original',
      createdAt: '2026-02-11T10:00:00.000Z',
    },
  ],
};

const listed: ProductSamplesResponse = { samples: [sample], latestSample: { id: sample.id, orderedOn: sample.orderedOn, verdict: 'pending', verdictAt: null }, photoLimitBytes: 40 * 1024 * 1024 };

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  forgetCsrfToken();
});

describe('the product page’s samples section', () => {
  it('lists the order with its cost in its currency and opens a photo larger, closing on Escape', async () => {
    fakeApi({ [`GET /api/products/${productId}/samples`]: { body: listed } });
    renderPage(<ProductSamplesSection product={product} />, { me: meAs('editor') });
    expect(await screen.findByRole('heading', { name: /^Ordered (3 Feb 2026|Feb 3, 2026) from Harbour Print Co\.$/ })).toBeTruthy();
    expect(screen.getByText('£12.50')).toBeTruthy();
    expect(screen.getByText('Awaiting verdict')).toBeTruthy();

    const thumb = screen.getByRole('button', { name: 'Open photo 1: mug-front.jpg' });
    thumb.focus();
    fireEvent.click(thumb);
    const viewer = screen.getByRole('dialog', { name: /Photo 1 of 1: mug-front\.jpg/ });
    expect((viewer.querySelector('img') as HTMLImageElement).getAttribute('src')).toBe('/api/sample-photos/photo-1/display');
    fireEvent.keyDown(viewer, { key: 'Escape' });
    await waitFor(() => expect(screen.queryByRole('dialog', { name: /Photo 1 of 1/ })).toBeNull());
    // focus goes back to the thumbnail that opened it
    expect(document.activeElement).toBe(screen.getByRole('button', { name: 'Open photo 1: mug-front.jpg' }));
  });

  it('asks for notes before recording "changes needed", and sends nothing without them', async () => {
    const { calls } = fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } },
      [`GET /api/products/${productId}/samples`]: { body: listed },
      [`POST /api/samples/${sample.id}/verdict`]: ({ body }) => ({ body: { ...sample, verdict: 'changes_needed', verdictNotes: (body as { notes: string }).notes } }),
    });
    renderPage(<ProductSamplesSection product={product} />, { me: meAs('owner') });
    fireEvent.click(await screen.findByRole('button', { name: 'Changes needed…' }));
    fireEvent.click(screen.getByRole('button', { name: 'Record changes needed' }));
    expect(screen.getByText(/Say what needs to change/)).toBeTruthy();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);

    fireEvent.change(screen.getByLabelText('What needs to change?'), { target: { value: 'The wave band is cut off at the handle' } });
    fireEvent.click(screen.getByRole('button', { name: 'Record changes needed' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ verdict: 'changes_needed', notes: 'The wave band is cut off at the handle' }));
  });

  it('shows a reviewer the samples without the controls to change them', async () => {
    fakeApi({ [`GET /api/products/${productId}/samples`]: { body: listed } });
    renderPage(<ProductSamplesSection product={product} />, { me: meAs('reviewer') });
    expect(await screen.findByText('£12.50')).toBeTruthy();
    for (const name of ['Record a sample order', 'Approve sample', 'Edit', 'Add photos…']) expect(screen.queryByRole('button', { name })).toBeNull();
  });

  it('says so when there is no sample yet, and when the list cannot be loaded', async () => {
    fakeApi({ [`GET /api/products/${productId}/samples`]: { body: { ...listed, samples: [], latestSample: null } } });
    renderPage(<ProductSamplesSection product={product} />, { me: meAs('editor') });
    expect(await screen.findByText('No sample ordered yet')).toBeTruthy();
    cleanup();
    fakeApi({ [`GET /api/products/${productId}/samples`]: { status: 500, body: { error: { code: 'internal', message: 'The database is resting.' } } } });
    renderPage(<ProductSamplesSection product={product} />, { me: meAs('editor') });
    expect(await screen.findByText('The database is resting.')).toBeTruthy();
  });
});
