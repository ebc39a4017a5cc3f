// @vitest-environment happy-dom
import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ExportStatusView } from '@shared/contracts/exports';
import type { ProductDetail } from '@shared/contracts/products';
import { builtInTemplates } from '@shared/templates/built-in-templates';
import { apiError, fakeApi } from '../../../testing/fake-api';
import { renderPage } from '../../../testing/render-page';
import { ProductExports } from './product-exports';

const slow = { timeout: 5000 };
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const template = (kind: string) => builtInTemplates.find((t) => t.kind === kind)!;
const product = (kind: string) => ({ id: 'prod-1', name: 'Puffin Picnic mug', revision: 4, template: template(kind) }) as unknown as ProductDetail;
const noneEarlier = { 'GET /api/products/prod-1/exports': { body: { exports: [] } } };
const status = (over: Partial<ExportStatusView>): ExportStatusView => ({
  id: 'exp-1', productId: 'prod-1', kind: 'bundle', status: 'running', progress: 0, files: [], error: null, productRevision: 4, createdAt: '2026-12-03T09:00:00.000Z', ...over,
});

describe('print files on a product page', () => {
  it('shows the food and heat cautions, makes the full pack with its progress, then offers the download', async () => {
    let polls = 0;
    const { calls } = fakeApi({
      ...noneEarlier,
      'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } },
      'POST /api/products/prod-1/exports': { status: 202, body: { id: 'exp-1' } },
      'GET /api/exports/exp-1': () => {
        polls += 1;
        return polls === 1
          ? { body: status({ progress: 0.4 }) }
          : { body: status({ status: 'done', progress: 1, files: [{ name: 'bundle.zip', contentType: 'application/zip', bytes: 3 * 1024 * 1024 }] }) };
      },
    });
    renderPage(<ProductExports product={product('mug-wrap')} canExport />);
    // the cautions are there before anything is made or downloaded
    expect(screen.getByText(/Hot drinks/)).toBeTruthy();
    expect(screen.getByText(/Dishwasher/)).toBeTruthy();
    expect(screen.getByText(/Microwave/)).toBeTruthy();

    fireEvent.click(screen.getByLabelText(/Full pack/));
    fireEvent.click(screen.getByLabelText('US Letter'));
    fireEvent.click(screen.getByRole('button', { name: 'Make the full pack' }));

    const bar = await screen.findByRole('progressbar', {}, slow);
    expect(bar.getAttribute('aria-valuenow')).toBe('40');
    const link = await screen.findByRole('link', { name: 'Download Full pack (zip)' }, slow);
    expect(link.getAttribute('href')).toBe('/api/exports/exp-1/download?file=bundle.zip');
    expect(screen.getByText('3.0 MB')).toBeTruthy();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ kind: 'bundle', paper: 'letter' });
    expect(calls.find((c) => c.method === 'POST')?.headers['x-csrf-token']).toBe('token-1');
  });

  it('says why a job failed, and why one could not start', async () => {
    fakeApi({
      ...noneEarlier,
      'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } },
      'POST /api/products/prod-1/exports': { status: 202, body: { id: 'exp-1' } },
      'GET /api/exports/exp-1': { body: status({ status: 'failed', error: { code: 'export.missing_motif', message: 'The motif “Kite” is no longer stored.' } }) },
    });
    renderPage(<ProductExports product={product('card')} canExport />);
    fireEvent.click(screen.getByRole('button', { name: 'Make the print file' }));
    expect(await screen.findByText('The motif “Kite” is no longer stored.', {}, slow)).toBeTruthy();
    cleanup();

    fakeApi({
      ...noneEarlier,
      'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } },
      'POST /api/products/prod-1/exports': apiError(403, 'auth.forbidden', 'Only editors and the owner can export.'),
    });
    renderPage(<ProductExports product={product('card')} canExport />);
    fireEvent.click(screen.getByRole('button', { name: 'Make the print file' }));
    expect(await screen.findByText('The export could not be started', {}, slow)).toBeTruthy();
    expect(screen.getByText(/Only editors and the owner can export/)).toBeTruthy();
  });

  it('lists files made on an earlier visit with their downloads, and says which came from an older layout', async () => {
    fakeApi({
      'GET /api/products/prod-1/exports': {
        body: {
          exports: [
            status({ id: 'exp-9', status: 'done', progress: 1, productRevision: 3, files: [{ name: 'bundle.zip', contentType: 'application/zip', bytes: 2048 }] }),
            status({ id: 'exp-8', kind: 'print-file', status: 'failed', error: { code: 'export.failed', message: 'The storage did not answer.' } }),
          ],
        },
      },
    });
    renderPage(<ProductExports product={product('mug-wrap')} canExport />);
    const link = await screen.findByRole('link', { name: /^Full pack \(zip\) · 2\.0 KB ?, made .*2026/ }, slow);
    expect(link.getAttribute('href')).toBe('/api/exports/exp-9/download?file=bundle.zip');
    expect(screen.getByText(/made from an earlier layout \(revision 3\)/)).toBeTruthy();
    expect(screen.getByText(/failed: The storage did not answer\./)).toBeTruthy();
  });

  it('gives a reviewer the cautions but no button, and a card no food-contact claims', () => {
    fakeApi(noneEarlier);
    renderPage(<ProductExports product={product('card')} canExport={false} />);
    expect(screen.queryByRole('button', { name: /Make/ })).toBeNull();
    expect(screen.getByText(/not meant for food or drink/)).toBeTruthy();
  });
});
