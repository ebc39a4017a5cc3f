// @vitest-environment happy-dom
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ProductDetail } from '@shared/contracts/products';
import { mug11oz } from '@shared/templates/built-in-templates';
import { apiError, fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { ProductPage } from './product-page';

// the page loads several queries; a busy test machine can take longer than the 1 s default
const slow = { timeout: 5000 };

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const id = '3b7f2c1e-5a4d-4e8f-9c2b-1d0e7a6f5b4c';
const product: ProductDetail = {
  id,
  name: 'Puffin Picnic mug',
  templateId: mug11oz.id,
  templateName: mug11oz.name,
  stage: 'sampling',
  revision: 4,
  placementCount: 1,
  updatedAt: '2026-03-01T10:00:00.000Z',
  createdAt: '2026-02-01T10:00:00.000Z',
  collectionId: null,
  collectionName: null,
  tags: ['gift'],
  variantCount: 1,
  latestSampleVerdict: 'pending',
  notes: 'Navy handle sells best',
  template: mug11oz,
  layout: { version: 2, mirror: false, placements: [] },
  motifs: [{ motifId: 'f1', name: 'Puffin with kite', originalId: 'o1', usedVersion: 1, currentVersion: 2, placementIds: ['p1'], rightsStatus: 'own_work', archived: false }],
};

const history = {
  moves: [
    { id: 'm1', fromStage: null, toStage: 'drafting', note: '', override: false, movedBy: { id: 'u1', name: 'Ines Okafor' }, createdAt: '2026-02-01T10:00:00.000Z' },
    { id: 'm2', fromStage: 'proofing', toStage: 'sampling', note: 'Ordered from Harbour Print Co.', override: false, movedBy: { id: 'u2', name: 'Teodor Vance' }, createdAt: '2026-02-20T10:00:00.000Z' },
  ],
};
const variants = { variants: [{ id: 'v1', productId: id, name: 'Navy handle', sku: 'PUF-MUG-NVY', options: { templateVariantId: mug11oz.variants[0].id }, position: 0 }] };

const routes = (extra = {}) => ({
  'GET /api/auth/csrf': { body: { csrfToken: 't' } },
  [`GET /api/products/${id}`]: { body: product },
  [`GET /api/products/${id}/stages`]: { body: history },
  [`GET /api/products/${id}/variants`]: { body: variants },
  [`GET /api/products/${id}/exports`]: { body: { exports: [] } },
  'GET /api/products': { body: { products: [product] } },
  'GET /api/collections': { body: { collections: [] } },
  ...extra,
});

const open = (role: 'owner' | 'reviewer') => renderPage(<ProductPage />, { path: '/products/:productId', url: `/products/${id}`, me: meAs(role) });

describe('the product’s page', () => {
  it('shows the preview, the stage history with names and notes, the variants and the motifs with versions and rights', async () => {
    fakeApi(routes());
    open('owner');
    expect(await screen.findByRole('heading', { name: 'Puffin Picnic mug' }, slow)).toBeTruthy();
    expect((screen.getByRole('img', { name: /Preview of Puffin Picnic mug: Front/ }) as HTMLImageElement).src).toContain(`/api/products/${id}/previews/front.png`);
    const stageHistory = await screen.findByRole('list', { name: 'Stage history, oldest first' }, slow);
    expect(stageHistory.textContent).toContain('Proofing → Sampling');
    expect(stageHistory.textContent).toContain('Teodor Vance');
    expect(stageHistory.textContent).toContain('Ordered from Harbour Print Co.');
    expect(((await screen.findAllByLabelText(/SKU/, undefined, slow))[0] as HTMLInputElement).value).toBe('PUF-MUG-NVY');
    expect(screen.getByText('Newer version 2 exists')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Open the layout' }).getAttribute('href')).toBe(`/products/${id}/layout`);
  });

  it('keeps a refused SKU in the field and shows which product has it', async () => {
    fakeApi(routes({ 'POST /api/products/3b7f2c1e-5a4d-4e8f-9c2b-1d0e7a6f5b4c/variants': apiError(409, 'variant.sku_taken', 'The SKU “LAN-MUG-BLK” is already used by “Lantern Walk mug” (Black).') }));
    open('owner');
    const form = await screen.findByRole('form', { name: 'New variant' }, slow);
    fireEvent.change(within(form).getByLabelText(/Variant/), { target: { value: 'Black handle' } });
    fireEvent.change(within(form).getByLabelText(/SKU/), { target: { value: 'LAN-MUG-BLK' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add variant' }));
    await waitFor(() => expect(form.textContent).toContain('Lantern Walk mug'), slow);
    expect((within(form).getByLabelText(/SKU/) as HTMLInputElement).value).toBe('LAN-MUG-BLK');
  });

  it('shows a reviewer the product without stage, variant or detail controls', async () => {
    fakeApi(routes());
    open('reviewer');
    await screen.findByRole('list', { name: 'Stage history, oldest first' }, slow);
    expect(screen.queryByRole('button', { name: 'Move to another stage' })).toBeNull();
    expect(screen.queryByRole('form', { name: 'New variant' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Save details' })).toBeNull();
    expect((await screen.findByText('PUF-MUG-NVY', undefined, slow)).tagName).toBe('SPAN');
    // details are read as text, not shown as a form the reviewer cannot use
    const details = screen.getByLabelText('Product details');
    expect(details.tagName).toBe('DL');
    expect(details.textContent).toContain('Navy handle sells best');
    expect(within(details).getByRole('list', { name: 'Tags' }).textContent).toBe('gift');
    expect(screen.queryByRole('textbox', { name: 'Notes' })).toBeNull();
  });
});
