import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { SalesSummary } from '@shared/contracts/sales';
import { forgetCsrfToken } from '../../../lib/api-client';
import { fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { periodPresets } from '../components/period-picker';
import { SalesPage } from './sales-page';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  forgetCsrfToken();
});

const { from, to } = periodPresets['12m'].period();
const summary = (splitRule: 'even' | 'area', puffinUnits: number): SalesSummary => ({
  from, to, splitRule, currency: 'GBP',
  currencies: [{ currency: 'GBP', units: 7, revenueMinor: 7800 }],
  totals: { units: 7, revenueMinor: 7800 },
  products: [
    { productId: 'p-tote', name: 'Wave tote', stage: 'listed', units: 3, revenueMinor: 6000 },
    { productId: 'p-mug', name: 'Puffin Picnic mug', stage: 'listed', units: 4, revenueMinor: 4800 },
  ],
  variants: [{ variantId: 'v-1', productId: 'p-mug', productName: 'Puffin Picnic mug', name: 'Blue handle', sku: 'MUG-BLUE', units: 4, revenueMinor: 4800 }],
  motifs: [{ motifId: 'm-puffin', name: 'Puffin in a jumper', units: puffinUnits, revenueMinor: 3900, shareOfUnits: puffinUnits / 7, productCount: 2 }],
  unmatched: [],
  granularity: 'week',
  series: [{ start: from, units: 7, revenueMinor: 7800 }],
});

describe('the what-sells page', () => {
  it('ranks products by units, says which split rule it uses and asks again when it changes', async () => {
    const { calls } = fakeApi({
      [`GET /api/sales/summary?from=${from}&to=${to}`]: { body: summary('even', 3.5) },
      [`GET /api/sales/summary?from=${from}&to=${to}&split=area`]: { body: summary('area', 4.5) },
      'GET /api/sales/settings': { body: { splitRule: 'even', columnMapping: null } },
      'GET /api/sales/imports': { body: { imports: [] } },
    });
    renderPage(<SalesPage />, { path: '/sales', me: meAs('reviewer') });
    const products = await screen.findByRole('table', { name: 'Products ranked' });
    const names = [...products.querySelectorAll('tbody tr')].map((tr) => tr.querySelector('a')?.textContent);
    expect(names).toEqual(['Puffin Picnic mug', 'Wave tote']);
    expect(screen.getByText(/Motif figures use the rule/).textContent).toContain('evenly');
    expect(screen.getByRole('table', { name: 'Motifs ranked, sales shared evenly' }).textContent).toContain('3.5');
    // the shop manager may import
    expect(screen.getByRole('button', { name: 'Choose a CSV file' })).toBeTruthy();
    expect(await screen.findByText('No sales imported yet')).toBeTruthy();

    fireEvent.click(screen.getByLabelText('By printed area'));
    expect(await screen.findByRole('table', { name: 'Motifs ranked, sales shared by printed area' })).toBeTruthy();
    await waitFor(() => expect(screen.getByText(/Motif figures use the rule/).textContent).toContain('by printed area'));
    expect(calls.some((c) => c.path.endsWith('&split=area'))).toBe(true);
    // ranking by revenue puts the tote's £60.00 above the mug's £48.00
    fireEvent.click(screen.getAllByLabelText('Revenue (GBP)')[0]);
    const reordered = [...screen.getByRole('table', { name: 'Products ranked' }).querySelectorAll('tbody tr')].map((tr) => tr.querySelector('a')?.textContent);
    expect(reordered).toEqual(['Wave tote', 'Puffin Picnic mug']);
  });
});
