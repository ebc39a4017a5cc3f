import { describe, expect, it } from 'vitest';
import { reviewStateOf } from './review-state';

const request = (createdAt: string, productRevision = 1) => ({ createdAt, productRevision });
const decision = (createdAt: string, kind: 'approved' | 'changes_requested', productRevision = 1) => ({ createdAt, productRevision, decision: kind });

describe('a product’s review state', () => {
  it('is none before anyone asked', () => {
    expect(reviewStateOf({ revision: 1, requests: [], decisions: [] })).toEqual({ status: 'none', decision: null, openRequest: null });
  });

  it('waits for a decision once asked', () => {
    const r = request('2026-03-01T10:00:00Z');
    expect(reviewStateOf({ revision: 1, requests: [r], decisions: [] })).toEqual({ status: 'requested', decision: null, openRequest: r });
  });

  it('takes the latest decision on the current revision', () => {
    const changes = decision('2026-03-01T11:00:00Z', 'changes_requested');
    const approved = decision('2026-03-01T12:00:00Z', 'approved');
    const state = reviewStateOf({ revision: 1, requests: [request('2026-03-01T10:00:00Z')], decisions: [approved, changes] });
    expect(state).toEqual({ status: 'approved', decision: approved, openRequest: null });
  });

  it('forgets a decision on an older revision: the layout changed since', () => {
    const state = reviewStateOf({ revision: 2, requests: [], decisions: [decision('2026-03-01T12:00:00Z', 'approved', 1)] });
    expect(state.status).toBe('none');
  });

  it('waits again when asked after changes were requested', () => {
    const again = request('2026-03-02T09:00:00Z', 2);
    const state = reviewStateOf({ revision: 2, requests: [request('2026-03-01T10:00:00Z'), again], decisions: [decision('2026-03-01T11:00:00Z', 'changes_requested')] });
    expect(state).toEqual({ status: 'requested', decision: null, openRequest: again });
  });
});
