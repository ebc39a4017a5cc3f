import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { MotifDetail } from '@shared/contracts/motifs';
import { forgetCsrfToken } from '../../../lib/api-client';
import { apiError, fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { MotifPage } from './motif-page';

const id = '66d19aef-281d-487d-9621-c33e78ff5924';
const version = {
  version: 1,
  current: true,
  width: 696,
  height: 480,
  pngBytes: 120_000,
  colours: [],
  originalId: '7f00c6e3-6790-44d9-bea8-93e40ba80368',
  originalName: 'lantern-walk.psd',
  samePixelsAs: null,
  imageUrl: `/api/motifs/${id}/image?version=1`,
  thumbUrl: `/api/motifs/${id}/image?size=thumb&version=1`,
  createdAt: '2026-03-01T10:00:00Z',
};
const fox: MotifDetail = {
  id,
  name: 'Fox with Lantern',
  sourcePath: 'Fox with Lantern',
  kind: 'group',
  hiddenInOriginal: false,
  archived: false,
  version: 1,
  width: 696,
  height: 480,
  offsetX: 220,
  offsetY: 1431,
  opacity: 1,
  blendMode: 'pass through',
  colours: [{ hex: '#e6813a', share: 0.58, oklab: { l: 0.7, a: 0.09, b: 0.12 } }],
  tags: ['fox', 'lantern'],
  suggestedTags: ['fox', 'lantern'],
  text: null,
  originalId: version.originalId,
  thumbUrl: version.thumbUrl,
  imageUrl: version.imageUrl,
  createdAt: '2026-03-01T10:00:00Z',
  rightsStatus: 'own_work',
  attributionRequired: false,
  updatedAt: '2026-03-01T10:00:00Z',
  originalName: 'lantern-walk.psd',
  collectionIds: [],
  usageCount: 0,
  notes: '',
  rights: { status: 'own_work', source: '', licence: '', attributionRequired: false },
  collections: [],
  versions: [version],
  original: { id: version.originalId, name: 'lantern-walk.psd', width: 1500, height: 2100, position: 3, sourcePath: 'Fox with Lantern', offsetX: 220, offsetY: 1431 },
  // The server's figures for 696 x 480 px.
  printSizes: [
    { ppi: 300, widthIn: 2.32, heightIn: 1.6, widthMm: 58.9, heightMm: 40.6 },
    { ppi: 150, widthIn: 4.64, heightIn: 3.2, widthMm: 117.9, heightMm: 81.3 },
  ],
  usage: [],
};

const routes = (detail: MotifDetail) => ({
  [`GET /api/motifs/${id}`]: { body: detail },
  [`GET /api/motifs/${id}/looks-like`]: { body: { maxDistance: 10, motifs: [] } },
  'GET /api/tags': { body: { tags: [] } },
  'GET /api/collections': { body: { collections: [] } },
  'GET /api/auth/csrf': { body: { csrfToken: 't' } },
});

const open = (role: 'owner' | 'reviewer') => renderPage(<MotifPage />, { path: '/library/:motifId', url: `/library/${id}`, me: meAs(role) });

beforeEach(() => forgetCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('motif page', () => {
  it('shows pixel size, the largest prints at 300 and 150 PPI, and a colour that searches the library', async () => {
    fakeApi(routes(fox));
    open('reviewer');
    await screen.findByRole('heading', { name: 'Fox with Lantern' });
    expect(screen.getByText('696 × 480 px')).toBeTruthy();
    // 696 px / 300 PPI = 2.32 in; 480 / 150 = 3.2 in.
    expect(screen.getByText(/2\.32 × 1\.6 in/)).toBeTruthy();
    expect(screen.getByText(/4\.64 × 3\.2 in/)).toBeTruthy();
    const swatch = screen.getByRole('link', { name: /#e6813a, 58 %/ });
    expect(swatch.getAttribute('href')).toBe('/library?colour=e6813a');
    expect(screen.getByText('No product uses this motif yet')).toBeTruthy();
  });

  it('names a layer motif by its layer path and order, and a whole picture without either', async () => {
    fakeApi(routes(fox));
    const layered = open('reviewer');
    await screen.findByRole('heading', { name: 'Fox with Lantern' });
    expect(screen.getByText('Layer path')).toBeTruthy();
    expect(screen.getByText(/in its layer order/)).toBeTruthy();
    layered.unmount();
    fakeApi(routes({ ...fox, kind: 'image' }));
    open('reviewer');
    await screen.findByRole('heading', { name: 'Fox with Lantern' });
    expect(screen.getByText('A whole flat image or drawing')).toBeTruthy();
    expect(screen.queryByText('Layer path')).toBeNull();
    expect(screen.queryByText(/in its layer order/)).toBeNull();
  });

  it('gives a reviewer no editing controls, only the download', async () => {
    fakeApi(routes(fox));
    open('reviewer');
    await screen.findByRole('heading', { name: 'Fox with Lantern' });
    expect(screen.getByRole('link', { name: 'Download PNG' }).getAttribute('href')).toBe(`/api/motifs/${id}/image?version=1&download=1`);
    for (const name of ['Rename…', 'Archive', 'Delete…', 'Save tags', 'Save rights']) {
      expect(screen.queryByRole('button', { name })).toBeNull();
    }
    expect(screen.queryByRole('combobox')).toBeNull();
  });

  it("shows the server's reason when a motif in use cannot be deleted", async () => {
    fakeApi({
      ...routes(fox),
      [`DELETE /api/motifs/${id}`]: apiError(409, 'motif.in_use', 'Fox with Lantern is used by 2 products; archive it instead.'),
    });
    open('owner');
    await screen.findByRole('heading', { name: 'Fox with Lantern' });
    fireEvent.click(screen.getByRole('button', { name: 'Delete…' }));
    const dialog = await screen.findByRole('dialog', { name: 'Delete Fox with Lantern?' });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Delete motif' }));
    expect((await within(dialog).findByRole('alert')).textContent).toContain('used by 2 products; archive it instead');
  });
});
