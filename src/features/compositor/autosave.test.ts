import { describe, expect, it, vi } from 'vitest';
import { emptyLayout, type Layout } from '@shared/scene';
import { Autosaver, describeSaveStatus } from './autosave';

const layoutWith = (n: number): Layout => ({ ...emptyLayout, mirror: n % 2 === 1 });

function fakeTimers() {
  let pending: (() => void) | null = null;
  return {
    timers: { set: (fn: () => void) => { pending = fn; return 1; }, clear: () => { pending = null; } },
    fire: () => { const f = pending; pending = null; f?.(); },
    get armed() { return pending !== null; },
  };
}

const failure = (e: unknown) => (e as { code: string; message: string });

describe('autosave', () => {
  it('saves once after a burst of changes, with the revision it loaded', async () => {
    const save = vi.fn(async (_l: Layout, revision: number) => ({ revision: revision + 1 }));
    const t = fakeTimers();
    const a = new Autosaver(emptyLayout, 7, save, failure, 1000, t.timers);
    a.changed(layoutWith(1));
    a.changed(layoutWith(2));
    a.changed(layoutWith(3));
    expect(a.getStatus().kind).toBe('pending');
    t.fire();
    await vi.waitFor(() => expect(a.getStatus()).toEqual({ kind: 'saved', revision: 8 }));
    expect(save).toHaveBeenCalledTimes(1);
    expect(save.mock.calls[0][1]).toBe(7);
    expect(describeSaveStatus(a.getStatus())).toBe('Saved · revision 8');
  });

  it('stops saving and explains the conflict when another tab saved first', async () => {
    const save = vi.fn(async () => { throw { code: 'product.stale', message: 'stale' }; });
    const t = fakeTimers();
    const a = new Autosaver(emptyLayout, 3, save, failure, 1000, t.timers);
    a.changed(layoutWith(1));
    t.fire();
    await vi.waitFor(() => expect(a.getStatus().kind).toBe('conflict'));
    expect(describeSaveStatus(a.getStatus())).toMatch(/another tab/);
    a.changed(layoutWith(2));
    expect(t.armed).toBe(false);
    expect(save).toHaveBeenCalledTimes(1);
    a.reset(layoutWith(5), 4);
    expect(a.getStatus()).toEqual({ kind: 'saved', revision: 4 });
  });

  it('saves changes made while a save was on its way, with the new revision', async () => {
    let resolve: (v: { revision: number }) => void = () => {};
    const save = vi.fn((_l: Layout, _r: number) => new Promise<{ revision: number }>((r) => { resolve = r; }));
    const t = fakeTimers();
    const a = new Autosaver(emptyLayout, 1, save, failure, 1000, t.timers);
    a.changed(layoutWith(1));
    t.fire();
    a.changed(layoutWith(2));
    resolve({ revision: 2 });
    await vi.waitFor(() => expect(a.getStatus().kind).toBe('pending'));
    t.fire();
    await vi.waitFor(() => expect(save).toHaveBeenCalledTimes(2));
    expect(save.mock.calls[1][1]).toBe(2);
  });

  it('shows other failures as the server’s message and keeps the changes for a retry', async () => {
    const save = vi.fn(async () => { throw { code: 'network.unreachable', message: 'Motifold could not reach its server.' }; });
    const t = fakeTimers();
    const a = new Autosaver(emptyLayout, 1, save, failure, 1000, t.timers);
    a.changed(layoutWith(1));
    t.fire();
    await vi.waitFor(() => expect(a.getStatus().kind).toBe('error'));
    expect(describeSaveStatus(a.getStatus())).toBe('Not saved: Motifold could not reach its server.');
    expect(a.hasUnsavedChanges).toBe(true);
  });
});
