import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { OriginalDetail } from '@shared/contracts/originals';
import { forgetCsrfToken } from '../../../lib/api-client';
import { fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { OriginalPage } from './original-page';

const id = '3a0eeb66-4989-41a1-b8db-5b05d884a0bd';

const base: OriginalDetail = {
  id,
  name: 'puffin-picnic.psd',
  fileKind: 'psd',
  byteSize: 1498945,
  status: 'ready',
  phase: 'done',
  percent: 100,
  cut: 'groups',
  width: 1500,
  height: 2100,
  layerCount: 40,
  motifCount: 1,
  error: null,
  previousOriginalId: null,
  uploadedBy: null,
  createdAt: '2026-03-01T10:00:00Z',
  importedAt: '2026-03-01T10:00:05Z',
  report: {
    created: 1,
    skipped: [{ sourcePath: 'Picnic/Empty layer', reason: 'it has no pixels' }],
    unsupported: [{ sourcePath: 'Title', feature: 'drop shadow (a layer effect)' }],
    notes: [],
    leftOut: [],
    linkedExisting: [],
    newVersions: [],
    unchanged: [],
    removed: [],
  },
  motifs: [
    {
      id: 'a9a5c9f2-55a4-4b3e-8a5c-0b3c2b8a1d10',
      // A layer name with markup: it must show as text.
      name: '<img src=x onerror=alert(1)> Puffin',
      sourcePath: 'Puffins/<b>Red</b>',
      kind: 'group',
      hiddenInOriginal: true,
      archived: false,
      version: 1,
      width: 400,
      height: 500,
      offsetX: 10,
      offsetY: 20,
      opacity: 1,
      blendMode: 'normal',
      colours: [],
      tags: [],
      suggestedTags: [],
      text: null,
      originalId: id,
      thumbUrl: '/api/motifs/a9a5c9f2-55a4-4b3e-8a5c-0b3c2b8a1d10/image?size=thumb&version=1',
      imageUrl: '/api/motifs/a9a5c9f2-55a4-4b3e-8a5c-0b3c2b8a1d10/image?version=1',
      createdAt: '2026-03-01T10:00:05Z',
      rightsStatus: 'own_work',
      attributionRequired: false,
      updatedAt: '2026-03-01T10:00:05Z',
      linkedExisting: false,
    },
  ],
};

const routeFor = (original: OriginalDetail) => ({
  [`GET /api/originals/${id}`]: { body: original },
  'GET /api/originals': { body: { originals: [original] } },
});

const open = (role: 'owner' | 'reviewer') =>
  renderPage(<OriginalPage />, { path: '/originals/:originalId', url: `/originals/${id}`, me: meAs(role) });

beforeEach(() => forgetCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('original page', () => {
  it('shows the size at 300 PPI, the import report in plain words and names from the file as text', async () => {
    fakeApi(routeFor(base));
    open('owner');
    await screen.findByRole('heading', { name: 'puffin-picnic.psd' });
    // 1500 x 2100 px at 300 PPI = 5 x 7 in (pixels / PPI).
    expect(screen.getByText('5 × 7 in')).toBeTruthy();
    expect(screen.getByText('1 layer was skipped')).toBeTruthy();
    expect(screen.getByText('— it has no pixels')).toBeTruthy();
    expect(screen.getByText('— drop shadow (a layer effect)')).toBeTruthy();
    expect(screen.getByText('<img src=x onerror=alert(1)> Puffin')).toBeTruthy();
    expect(document.querySelector('img[src="x"]')).toBeNull();
    expect(screen.getByText('Hidden in the original')).toBeTruthy();
  });

  it('lists what was left out of an SVG drawing for safety in its own section', async () => {
    fakeApi(routeFor({ ...base, fileKind: 'svg', name: 'lantern-sign.svg', report: { ...base.report!, skipped: [], unsupported: [], leftOut: ['1 script element', '2 links outside the drawing'] } }));
    open('owner');
    await screen.findByRole('heading', { name: 'lantern-sign.svg' });
    expect(screen.getByText('SVG drawing')).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Left out for safety' })).toBeTruthy();
    expect(screen.getByText('1 script element')).toBeTruthy();
    expect(screen.getByText('2 links outside the drawing')).toBeTruthy();
    expect(screen.queryByText('Nothing left out')).toBeNull();
    expect(screen.queryByText('Not drawn in the motifs')).toBeNull();
    // a drawing is one motif: no layers, no cut, nothing to cut again
    expect(screen.queryByText('Layers')).toBeNull();
    expect(screen.queryByText('Cut')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Cut again…' })).toBeNull();
    expect(screen.getByRole('link', { name: 'Upload a new version' })).toBeTruthy();
    // the report and motif list speak of the picture, not of layers
    expect(screen.getByText('How the file was read, and what was left out.')).toBeTruthy();
    expect(screen.queryByText('What became of each layer in the file.')).toBeNull();
    expect(screen.queryByText(/in the order of its layers/)).toBeNull();
    expect(screen.queryByText(/Layers and groups|Every layer with pixels/)).toBeNull();
  });

  it('gives an owner re-cut, new version and delete; a reviewer none of them', async () => {
    fakeApi(routeFor(base));
    const owner = open('owner');
    await screen.findByRole('heading', { name: 'puffin-picnic.psd' });
    expect(screen.getByRole('button', { name: 'Cut again…' })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Upload a new version' }).getAttribute('href')).toBe(`/originals?versionOf=${id}`);
    expect(screen.getByRole('button', { name: 'Delete…' })).toBeTruthy();
    owner.unmount();

    open('reviewer');
    await screen.findByRole('heading', { name: 'puffin-picnic.psd' });
    expect(screen.queryByRole('button', { name: 'Cut again…' })).toBeNull();
    expect(screen.queryByRole('link', { name: 'Upload a new version' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Delete…' })).toBeNull();
  });

  it('shows a running import as its phase and percent', async () => {
    fakeApi(routeFor({ ...base, status: 'importing', phase: 'encoding', percent: 62, report: null, motifs: [] }));
    open('owner');
    const bar = await screen.findByRole('progressbar', { name: /Making images and thumbnails/ });
    expect(bar.getAttribute('aria-valuenow')).toBe('62');
  });

  it("shows a failed import's message, and starts it again on Retry", async () => {
    const failed: OriginalDetail = {
      ...base,
      status: 'failed',
      report: null,
      motifs: [],
      error: { code: 'psd.unsupported_depth', message: '16-bit PSD files are not supported yet (8 bits per channel are); save a copy as 8-bit' },
    };
    const queued: OriginalDetail = { ...failed, status: 'queued', phase: 'queued', percent: 0, error: null };
    let retried = false;
    const api = fakeApi({
      ...routeFor(failed),
      [`GET /api/originals/${id}`]: () => ({ body: retried ? queued : failed }),
      'GET /api/auth/csrf': { body: { csrfToken: 't' } },
      [`POST /api/originals/${id}/retry`]: () => {
        retried = true;
        return { status: 202, body: queued };
      },
    });
    open('owner');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('16-bit PSD files are not supported yet');
    expect(within(alert).getByRole('button', { name: 'Delete it' })).toBeTruthy();
    fireEvent.click(within(alert).getByRole('button', { name: 'Try the import again' }));
    await waitFor(() => expect(api.calls.some((c) => c.method === 'POST' && c.path.endsWith('/retry'))).toBe(true));
    expect(await screen.findByRole('progressbar')).toBeTruthy();
  });
});
