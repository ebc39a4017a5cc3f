// @vitest-environment happy-dom
import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ProductSummary } from '@shared/contracts/products';
import { fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { ProductsPage } from './products-page';

// the page loads several queries; a busy test machine can take longer than the 1 s default
const slow = { timeout: 5000 };

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const base: Omit<ProductSummary, 'id' | 'name' | 'stage'> = {
  templateId: 'mug-11oz', templateName: '11 oz ceramic mug wrap', revision: 1, placementCount: 0,
  updatedAt: '2026-03-01T10:00:00.000Z', createdAt: '2026-02-01T10:00:00.000Z',
  collectionId: null, collectionName: null, tags: [], variantCount: 0, latestSampleVerdict: null,
};
const products: ProductSummary[] = [
  { ...base, id: 'a', name: 'Puffin Picnic mug', stage: 'sampling', collectionId: 'c1', collectionName: 'Coastal Spring', tags: ['gift'] },
  { ...base, id: 'b', name: 'Lantern Walk tote', stage: 'drafting', templateId: 'tote-panel', templateName: 'Tote bag panel' },
  { ...base, id: 'c', name: 'Kite card', stage: 'listed' },
];

const open = (url = '/products') => {
  fakeApi({ 'GET /api/products': { body: { products } }, 'GET /api/templates': { body: { templates: [] } } });
  return renderPage(<ProductsPage />, { path: '/products', url, me: meAs('editor') });
};
const rowNames = () => within(screen.getByRole('table')).getAllByRole('link').map((a) => a.textContent);

describe('the products page', () => {
  it('lists products in a table, sorts by stage along the path and filters by collection', async () => {
    const { router } = open();
    await screen.findByRole('table', undefined, slow);
    fireEvent.click(screen.getByRole('button', { name: 'Stage' }));
    expect(rowNames()).toEqual(['Lantern Walk tote', 'Puffin Picnic mug', 'Kite card']);
    fireEvent.change(screen.getByLabelText('Collection'), { target: { value: 'c1' } });
    expect(rowNames()).toEqual(['Puffin Picnic mug']);
    expect(router.state.location.search).toBe('?collection=c1');
  });

  it('shows the board by stage when the address asks for it, and switches back to the table', async () => {
    const { router } = open('/products?view=board&tag=gift');
    const sampling = await screen.findByRole('list', { name: 'Sampling: 1 product' }, slow);
    expect(within(sampling).getByText('Puffin Picnic mug')).toBeTruthy();
    expect(screen.getByRole('list', { name: 'Drafting: 0 products' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Table' }));
    expect(router.state.location.search).toBe('?tag=gift');
    expect(await screen.findByRole('table', undefined, slow)).toBeTruthy();
  });
});
