// @vitest-environment happy-dom
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ProductSummary } from '@shared/contracts/products';
import { apiError, fakeApi } from '../../../testing/fake-api';
import { renderPage } from '../../../testing/render-page';
import { ProductsBoard } from './products-board';

// the page loads several queries; a busy test machine can take longer than the 1 s default
const slow = { timeout: 5000 };

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const mug: ProductSummary = {
  id: '3b7f2c1e-5a4d-4e8f-9c2b-1d0e7a6f5b4c',
  name: 'Puffin Picnic mug',
  templateId: 'mug-11oz',
  templateName: '11 oz ceramic mug wrap',
  stage: 'drafting',
  revision: 3,
  placementCount: 4,
  updatedAt: '2026-03-01T10:00:00.000Z',
  createdAt: '2026-02-01T10:00:00.000Z',
  collectionId: null,
  collectionName: null,
  tags: [],
  variantCount: 2,
  latestSampleVerdict: null,
};

const moved = (from: string, to: string, override = false) => ({
  body: { stage: to, move: { id: 'm1', fromStage: from, toStage: to, note: '', override, movedBy: { id: 'u1', name: 'Ines Okafor' }, createdAt: '2026-03-02T10:00:00.000Z' } },
});

// Opens the card's "Move to…" menu from the keyboard and picks a stage with the arrow keys.
function moveWithKeys(stageName: string) {
  const button = screen.getByRole('button', { name: 'Move “Puffin Picnic mug” to another stage' });
  button.focus();
  fireEvent.keyDown(button, { key: 'ArrowDown' });
  const menu = screen.getByRole('menu');
  for (let i = 0; i < 6 && document.activeElement?.textContent !== stageName; i++) fireEvent.keyDown(menu, { key: 'ArrowDown' });
  expect(document.activeElement?.textContent).toBe(stageName);
  fireEvent.click(document.activeElement!);
}

describe('products board', () => {
  it('shows each product in its stage column and offers only the moves the rules allow', () => {
    fakeApi({});
    renderPage(<ProductsBoard products={[mug]} canMove canOverride={false} />);
    const drafting = screen.getByRole('list', { name: 'Drafting: 1 product' });
    expect(within(drafting).getByText('Puffin Picnic mug')).toBeTruthy();
    fireEvent.keyDown(screen.getByRole('button', { name: /Move “Puffin Picnic mug”/ }), { key: 'ArrowDown' });
    expect(screen.getAllByRole('menuitem').map((i) => i.textContent)).toEqual(['Idea', 'Proofing', 'Retired']);
  });

  it('moves a card to the next stage from the keyboard, with the note typed in the prompt', async () => {
    const { calls } = fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } },
      [`POST /api/products/${mug.id}/stage`]: moved('drafting', 'proofing'),
    });
    renderPage(<ProductsBoard products={[mug]} canMove canOverride={false} />);
    moveWithKeys('Proofing');
    const dialog = await screen.findByRole('dialog', undefined, slow);
    expect(dialog.textContent).toContain('Move “Puffin Picnic mug” to Proofing');
    fireEvent.change(within(dialog).getByLabelText(/Note/), { target: { value: 'Proof ordered on the printer’s site' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Move to Proofing' }));
    await waitFor(() => expect(calls.some((c) => c.path.endsWith('/stage'))).toBe(true), slow);
    expect(calls.find((c) => c.path.endsWith('/stage'))?.body).toEqual({ to: 'proofing', note: 'Proof ordered on the printer’s site' });
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull(), slow);
  });

  it('explains a refusal by the sample gate and lets an owner override with a note', async () => {
    const sampling = { ...mug, stage: 'sampling' as const };
    const { calls } = fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } },
      [`POST /api/products/${mug.id}/stage`]: apiError(409, 'stage.needs_approved_sample', 'No sample has been recorded for this product yet.'),
      [`POST /api/products/${mug.id}/stage/override`]: moved('sampling', 'ready', true),
    });
    renderPage(<ProductsBoard products={[sampling]} canMove canOverride />);
    moveWithKeys('Ready');
    const dialog = await screen.findByRole('dialog', undefined, slow);
    fireEvent.click(within(dialog).getByRole('button', { name: 'Move to Ready' }));
    expect((await within(dialog).findByRole('alert', undefined, slow)).textContent).toContain('No sample has been recorded');
    fireEvent.click(within(dialog).getByRole('button', { name: 'Move anyway as owner…' }));
    const confirm = within(dialog).getByRole('button', { name: 'Move without a sample' }) as HTMLButtonElement;
    expect(confirm.disabled).toBe(true);
    fireEvent.change(within(dialog).getByLabelText(/Note/), { target: { value: 'Same blank as the approved spring mug' } });
    fireEvent.click(confirm);
    await waitFor(() => expect(calls.some((c) => c.path.endsWith('/stage/override'))).toBe(true), slow);
    expect(calls.find((c) => c.path.endsWith('/stage/override'))?.body).toEqual({ to: 'ready', note: 'Same blank as the approved spring mug' });
  });

  it('moves a card dropped on the next column, and ignores a drop where the rules allow no move', async () => {
    const ready = { ...mug, stage: 'ready' as const };
    const { calls } = fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } },
      [`POST /api/products/${mug.id}/stage`]: moved('ready', 'listed'),
    });
    renderPage(<ProductsBoard products={[ready]} canMove canOverride={false} />);
    const held = new Map<string, string>();
    const dataTransfer = { setData: (k: string, v: string) => held.set(k, v), getData: (k: string) => held.get(k) ?? '', effectAllowed: 'all', dropEffect: 'none' };
    const card = screen.getByText('Puffin Picnic mug').closest('li')!;
    const column = (label: string) => screen.getByRole('heading', { name: new RegExp(`^${label}`) }).closest('section')!;
    fireEvent.dragStart(card, { dataTransfer });
    // dropped back on its own column: nothing to move, no prompt
    fireEvent.dragOver(column('Ready'), { dataTransfer });
    fireEvent.drop(column('Ready'), { dataTransfer });
    expect(screen.queryByText(/Move “Puffin Picnic mug” to/)).toBeNull();
    fireEvent.dragStart(card, { dataTransfer });
    fireEvent.dragOver(column('Listed'), { dataTransfer });
    fireEvent.drop(column('Listed'), { dataTransfer });
    const dialog = await screen.findByRole('dialog', undefined, slow);
    expect(dialog.textContent).toContain('Move “Puffin Picnic mug” to Listed');
    fireEvent.click(within(dialog).getByRole('button', { name: 'Move to Listed' }));
    await waitFor(() => expect(calls.find((c) => c.path.endsWith('/stage'))?.body).toEqual({ to: 'listed', note: '' }), slow);
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull(), slow);
  });

  it('hides the move controls from someone who may not move products, and does not let their cards drag', () => {
    fakeApi({});
    renderPage(<ProductsBoard products={[mug]} canMove={false} canOverride={false} />);
    expect(screen.queryByRole('button', { name: /Move “Puffin Picnic mug”/ })).toBeNull();
    expect(screen.getByText('Puffin Picnic mug').closest('li')?.getAttribute('draggable')).toBe('false');
  });
});
