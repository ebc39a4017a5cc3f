import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { LibraryMotif, MotifListResponse } from '@shared/contracts/motifs';
import { forgetCsrfToken } from '../../../lib/api-client';
import { fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { LibraryPage } from './library-page';

const names = ['Puffin Red Jumper', 'Puffin Teal Jumper', 'Picnic basket', 'Kite', 'Wave band'];
const motifs: LibraryMotif[] = names.map((name, i) => ({
  id: `00000000-0000-4000-8000-00000000000${i}`,
  name,
  sourcePath: name,
  kind: 'group',
  hiddenInOriginal: false,
  archived: false,
  version: 1,
  width: 400,
  height: 400,
  offsetX: 0,
  offsetY: 0,
  opacity: 1,
  blendMode: 'pass through',
  colours: [{ hex: '#c8283c', share: 0.5, oklab: { l: 0.55, a: 0.18, b: 0.07 } }],
  tags: [],
  suggestedTags: [],
  text: null,
  originalId: '3a0eeb66-4989-41a1-b8db-5b05d884a0bd',
  thumbUrl: `/api/motifs/${i}/image?size=thumb&version=1`,
  imageUrl: `/api/motifs/${i}/image?version=1`,
  createdAt: '2026-03-01T10:00:00Z',
  rightsStatus: 'own_work',
  attributionRequired: false,
  updatedAt: '2026-03-01T10:00:00Z',
  originalName: 'puffin-picnic.psd',
  collectionIds: [],
  usageCount: 0,
  score: null,
  colourMatch: null,
}));

const page = (list: LibraryMotif[]): MotifListResponse => ({
  motifs: list,
  total: list.length,
  offset: 0,
  limit: 120,
  nextOffset: null,
  facets: { tags: [], rights: { own_work: list.length, licensed: 0, public_domain: 0, unknown: 0 }, collections: [], originals: [], used: 0, unused: list.length, hiddenInOriginal: 0, archived: 0 },
});

const routes = {
  'GET /api/motifs?sort=best&offset=0&limit=120': { body: page(motifs) },
  'GET /api/motifs?q=puffin&sort=best&offset=0&limit=120': { body: page(motifs.slice(0, 2)) },
  'GET /api/tags': { body: { tags: [{ tag: 'puffin', count: 2, archivedCount: 0 }] } },
  'GET /api/collections': { body: { collections: [] } },
  'GET /api/originals': { body: { originals: [] } },
  'GET /api/auth/csrf': { body: { csrfToken: 't' } },
  'POST /api/motifs/bulk': { body: { matched: 3, changed: 3 } },
};

const tile = (name: string) => screen.getByRole('link', { name: new RegExp(`^${name}`) });

beforeEach(() => forgetCsrfToken());
afterEach(() => {
  cleanup();
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

describe('library page', () => {
  it('shows a reviewer the motifs and their count, without selection or bulk editing', async () => {
    fakeApi(routes);
    renderPage(<LibraryPage />, { path: '/library', me: meAs('reviewer') });
    await screen.findByText('5 motifs');
    expect(tile('Kite').getAttribute('href')).toBe(`/library/${motifs[3].id}`);
    expect(screen.queryByRole('checkbox', { name: /^Select / })).toBeNull();
    fireEvent.click(tile('Kite'), { ctrlKey: true });
    expect(screen.queryByText(/selected/)).toBeNull();
  });

  it('lets an editor Ctrl-click and Shift-click a range, then tag the selection in one request', async () => {
    const api = fakeApi(routes);
    renderPage(<LibraryPage />, { path: '/library', me: meAs('editor') });
    await screen.findByText('5 motifs');
    fireEvent.click(tile('Puffin Teal Jumper'), { ctrlKey: true });
    expect(screen.getByText('1 motif selected')).toBeTruthy();
    fireEvent.click(tile('Wave band'), { shiftKey: true });
    expect(screen.getByText('4 motifs selected')).toBeTruthy();
    fireEvent.click(tile('Kite'), { ctrlKey: true });
    expect(screen.getByText('3 motifs selected')).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Add tags…' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add tags to 3 motifs' });
    const box = within(dialog).getByRole('combobox', { name: 'Tags' });
    fireEvent.change(box, { target: { value: 'coastal spring' } });
    fireEvent.keyDown(box, { key: 'Enter' });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Add tags' }));

    await screen.findByText('Tagged 3 motifs with “coastal spring”.');
    const bulk = api.calls.find((c) => c.path === '/api/motifs/bulk');
    expect(bulk?.body).toEqual({ ids: [motifs[1].id, motifs[2].id, motifs[4].id], action: { type: 'tag', tags: ['coastal spring'] } });
  });

  it('"select all" sends the filter, not a list of ids', async () => {
    const api = fakeApi(routes);
    renderPage(<LibraryPage />, { path: '/library', me: meAs('owner') });
    await screen.findByText('5 motifs');
    fireEvent.click(tile('Kite'), { ctrlKey: true });
    fireEvent.click(screen.getByRole('button', { name: 'Select all 5' }));
    expect(screen.getByText('All 5 motifs of this search selected')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Archive' }));
    await waitFor(() => expect(api.calls.some((c) => c.path === '/api/motifs/bulk')).toBe(true));
    const bulk = api.calls.find((c) => c.path === '/api/motifs/bulk');
    expect(bulk?.body).toMatchObject({ filter: { usage: 'any', archived: 'exclude' }, action: { type: 'archive' } });
    expect(bulk?.body).not.toHaveProperty('ids');
  });

  it('searches as you type, after a pause, and keeps the words in the address', async () => {
    const api = fakeApi(routes);
    const { router } = renderPage(<LibraryPage />, { path: '/library', me: meAs('reviewer') });
    await screen.findByText('5 motifs');
    fireEvent.change(screen.getByRole('searchbox', { name: 'Search motifs' }), { target: { value: 'puffin' } });
    expect(router.state.location.search).toBe('');
    await waitFor(() => expect(router.state.location.search).toBe('?q=puffin'));
    expect(await screen.findByText('2 motifs')).toBeTruthy();
    expect(api.calls.some((c) => c.path.startsWith('/api/motifs?q=puffin'))).toBe(true);
  });
});
