import { describe, expect, it } from 'vitest';
import { decideStageMove, isMoveAllowed, needsApprovedSample, stagesReachableFrom, type StageMoveRequest } from './stage-rules';

const base: StageMoveRequest = { from: 'sampling', to: 'ready', latestSampleVerdict: 'approved', note: '', override: false, mayOverride: false };

describe('which stage moves are allowed', () => {
  it('moves forward one stage at a time and never skips one', () => {
    expect(isMoveAllowed('idea', 'drafting')).toBe(true);
    expect(isMoveAllowed('drafting', 'sampling')).toBe(false);
    expect(isMoveAllowed('proofing', 'listed')).toBe(false);
  });

  it('goes back to any earlier stage and retires from anywhere', () => {
    expect(isMoveAllowed('listed', 'drafting')).toBe(true);
    expect(isMoveAllowed('idea', 'retired')).toBe(true);
    expect(isMoveAllowed('retired', 'listed')).toBe(true);
    expect(isMoveAllowed('ready', 'ready')).toBe(false);
  });

  it('lists the stages reachable from drafting', () => {
    expect(stagesReachableFrom('drafting')).toEqual(['idea', 'proofing', 'retired']);
  });
});

describe('the sample gate', () => {
  it('guards entering ready or listed from an earlier stage or from retired', () => {
    expect(needsApprovedSample('sampling', 'ready')).toBe(true);
    expect(needsApprovedSample('retired', 'listed')).toBe(true);
    expect(needsApprovedSample('ready', 'listed')).toBe(false);
    expect(needsApprovedSample('listed', 'retired')).toBe(false);
  });

  it('lets an approved latest sample through without an override', () => {
    expect(decideStageMove(base)).toEqual({ ok: true, override: false });
  });

  it('refuses without an approved sample, naming what is missing', () => {
    const none = decideStageMove({ ...base, latestSampleVerdict: null });
    expect(none).toMatchObject({ ok: false, error: { status: 409, code: 'stage.needs_approved_sample' } });
    const changes = decideStageMove({ ...base, latestSampleVerdict: 'changes_needed' });
    expect(changes.ok ? '' : changes.error.message).toMatch(/needs changes/);
  });

  it('lets an owner override with a note, and records that it was an override', () => {
    expect(decideStageMove({ ...base, latestSampleVerdict: 'pending', override: true, mayOverride: true, note: 'Printer is our usual one' })).toEqual({ ok: true, override: true });
  });

  it('refuses an override without a note or by someone who may not override', () => {
    expect(decideStageMove({ ...base, latestSampleVerdict: null, override: true, mayOverride: true, note: '  ' })).toMatchObject({ ok: false, error: { code: 'stage.override_needs_note' } });
    expect(decideStageMove({ ...base, latestSampleVerdict: null, override: true, mayOverride: false, note: 'please' })).toMatchObject({ ok: false, error: { status: 403, code: 'stage.override_forbidden' } });
  });

  it('explains a skipped stage with the next one', () => {
    const skip = decideStageMove({ ...base, from: 'drafting', to: 'ready' });
    expect(skip).toMatchObject({ ok: false, error: { status: 400, code: 'stage.not_allowed' } });
    expect(skip.ok ? '' : skip.error.message).toContain('Proofing');
  });
});
