import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ProductDetail } from '@shared/contracts/products';
import type { CommentThread, ProductReview } from '@shared/contracts/reviews';
import { mug11oz } from '@shared/templates/built-in-templates';
import { forgetCsrfToken } from '../../../lib/api-client';
import { fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { ProductReviewSection } from './product-review-section';

const productId = '0b8f3c1e-5d2a-4f6b-9c7e-1a2b3c4d5e6f';
const product = { id: productId, name: 'Puffin Picnic mug', revision: 3, template: mug11oz } as ProductDetail;

const thread = (id: string, createdAt: string, anchor: CommentThread['anchor'], body: string, resolved = false): CommentThread => ({
  id,
  productId,
  anchor,
  productRevision: 3,
  resolved,
  resolvedAt: resolved ? createdAt : null,
  resolvedBy: null,
  createdBy: { id: 'user-june', name: 'June Abara' },
  createdAt,
  comments: [{ id: `${id}-c`, body, author: { id: 'user-june', name: 'June Abara' }, createdAt }],
});

const threads = [
  thread('t-kite', '2026-03-01T10:00:00.000Z', { surface: 'preview', view: 'front', x: 0.25, y: 0.4 }, 'Kite string too thin'),
  thread('t-back', '2026-03-01T11:00:00.000Z', { surface: 'preview', view: 'back', x: 0.7, y: 0.2 }, 'Wave band gap'),
  thread('t-general', '2026-03-01T12:00:00.000Z', null, 'Lovely overall'),
];
const review: ProductReview = { revision: 3, state: { status: 'none', decision: null, openRequest: null }, requests: [], decisions: [], reviewers: [{ id: 'user-june', name: 'June Abara' }] };

function routes(extra: Parameters<typeof fakeApi>[0] = {}) {
  return fakeApi({
    'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } },
    [`GET /api/products/${productId}/threads`]: { body: { threads } },
    [`GET /api/products/${productId}/review`]: { body: review },
    ...extra,
  });
}

async function previewShown() {
  const image = await screen.findByRole('img', { name: /Preview of the product, front view/ });
  fireEvent.load(image);
  return image;
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  forgetCsrfToken();
});

describe('the product page’s review section', () => {
  it('numbers the pins of the shown view, and selecting a pin highlights its thread and back', async () => {
    routes();
    renderPage(<ProductReviewSection product={product} />, { me: meAs('reviewer') });
    const image = await previewShown();
    expect(image.getAttribute('src')).toBe(`/api/products/${productId}/previews/front.png?revision=3`);
    const pin = screen.getByRole('button', { name: 'Comment 1: Kite string too thin' });
    // the back view's pin is not drawn on the front
    expect(screen.queryByRole('button', { name: /^Comment 2:/ })).toBeNull();

    fireEvent.click(pin);
    const listed = screen.getByRole('button', { name: /Comment 1\. On the front preview/ });
    expect(listed.getAttribute('aria-pressed')).toBe('true');

    // choosing the back thread in the list turns the preview to the back view and highlights its pin
    fireEvent.click(screen.getByRole('button', { name: /Comment 2\. On the back preview/ }));
    const back = await screen.findByRole('img', { name: /back view/ });
    fireEvent.load(back);
    expect(screen.getByRole('button', { name: 'Comment 2: Wave band gap' }).getAttribute('aria-pressed')).toBe('true');
    expect(screen.queryByRole('button', { name: 'Comment 1: Kite string too thin' })).toBeNull();
    expect(screen.getByRole('button', { name: /Comment 1\. On the front preview/ }).getAttribute('aria-pressed')).toBe('false');
  });

  it('opens on the thread a notification links to, turning to its view', async () => {
    routes();
    renderPage(<ProductReviewSection product={product} />, { me: meAs('editor'), url: '/?thread=t-back' });
    const back = await screen.findByRole('img', { name: /back view/ });
    fireEvent.load(back);
    expect(screen.getByRole('button', { name: 'Comment 2: Wave band gap' }).getAttribute('aria-pressed')).toBe('true');
  });

  it('lets a keyboard user move a new pin with the arrows, place it with Enter and post the comment there', async () => {
    const { calls } = routes({
      [`POST /api/products/${productId}/threads`]: ({ body }) => ({ status: 201, body: { ...thread('t-new', '2026-03-02T10:00:00.000Z', (body as { anchor: CommentThread['anchor'] }).anchor, 'Move the puffin left') } }),
    });
    renderPage(<ProductReviewSection product={product} />, { me: meAs('reviewer') });
    await previewShown();
    fireEvent.click(screen.getByRole('button', { name: 'Pin with the keyboard' }));
    const draft = await screen.findByRole('button', { name: /New pin at 50 % across, 50 % down/ });
    await waitFor(() => expect(document.activeElement).toBe(draft));
    fireEvent.keyDown(draft, { key: 'ArrowRight' });
    fireEvent.keyDown(screen.getByRole('button', { name: /New pin at/ }), { key: 'ArrowUp', shiftKey: true });
    fireEvent.keyDown(screen.getByRole('button', { name: /New pin at 52 % across, 40 % down/ }), { key: 'Enter' });

    const box = await screen.findByLabelText('Comment at the new pin (front view)');
    fireEvent.change(box, { target: { value: '  Move the puffin left ' } });
    fireEvent.click(screen.getByRole('button', { name: 'Post comment' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST')).toBe(true));
    const post = calls.find((c) => c.method === 'POST')!;
    expect(post.body).toEqual({ body: 'Move the puffin left', anchor: { surface: 'preview', view: 'front', x: 0.52, y: 0.4 } });
  });

  it('shows a reviewer Approve but no Resolve, and an editor Resolve and Ask for review but no Approve', async () => {
    routes();
    const first = renderPage(<ProductReviewSection product={product} />, { me: meAs('reviewer') });
    const thread1 = (await screen.findByText('Kite string too thin')).closest('li')!.parentElement!.closest('li')!;
    expect(within(thread1).getByRole('button', { name: 'Reply' })).toBeTruthy();
    expect(within(thread1).queryByRole('button', { name: 'Resolve' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Approve' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Ask for review' })).toBeNull();
    first.unmount();

    renderPage(<ProductReviewSection product={product} />, { me: meAs('editor') });
    await screen.findByText('Kite string too thin');
    expect(screen.getAllByRole('button', { name: 'Resolve' })).toHaveLength(3);
    expect(screen.getByRole('button', { name: 'Ask for review' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Approve' })).toBeNull();
  });

  it('asks for a note before sending “Ask for changes”, and sends nothing without one', async () => {
    const { calls } = routes();
    renderPage(<ProductReviewSection product={product} />, { me: meAs('reviewer') });
    fireEvent.click(await screen.findByRole('button', { name: 'Ask for changes' }));
    fireEvent.click(screen.getByRole('button', { name: 'Ask for changes' }));
    expect((await screen.findByRole('alert')).textContent).toBe('Write something first');
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);
  });
});
