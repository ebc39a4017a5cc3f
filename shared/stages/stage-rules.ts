import { productStages, type ProductStage } from '../contracts/stages';

export type SampleVerdictView = 'pending' | 'approved' | 'changes_needed' | null;

export type StageMoveRequest = {
  from: ProductStage;
  to: ProductStage;
  // the verdict of the product's most recent sample; null when none was recorded
  latestSampleVerdict: SampleVerdictView;
  note: string;
  override: boolean;
  mayOverride: boolean;
};

export type StageMoveError = { status: 400 | 403 | 409; code: string; message: string };
export type StageMoveDecision = { ok: true; override: boolean } | { ok: false; error: StageMoveError };

const indexOf = (s: ProductStage) => productStages.indexOf(s);

// The path is walked one step at a time so nothing is skipped (a sample before "ready");
// going back is always allowed (a proof failed, a listing was pulled), and a product can be
// retired from anywhere. A retired product may come back to any stage, gate permitting.
export function isMoveAllowed(from: ProductStage, to: ProductStage): boolean {
  if (from === to) return false;
  if (to === 'retired' || from === 'retired') return true;
  const step = indexOf(to) - indexOf(from);
  return step === 1 || step < 0;
}

export function stagesReachableFrom(from: ProductStage): ProductStage[] {
  return productStages.filter((to) => isMoveAllowed(from, to));
}

// Entering "ready" or "listed" from a stage before them (or from retired) needs an approved sample.
export function needsApprovedSample(from: ProductStage, to: ProductStage): boolean {
  const gated = (s: ProductStage) => s === 'ready' || s === 'listed';
  return gated(to) && !gated(from);
}

const stageName = (s: ProductStage) => s.charAt(0).toUpperCase() + s.slice(1);

function gateMessage(verdict: SampleVerdictView): string {
  if (verdict === null) return 'No sample has been recorded for this product yet. Record a sample and approve it before moving it to ready.';
  if (verdict === 'pending') return 'The latest sample has no verdict yet. Approve it before moving the product to ready.';
  return 'The latest sample needs changes. Approve a new sample before moving the product to ready.';
}

export function decideStageMove(req: StageMoveRequest): StageMoveDecision {
  const { from, to } = req;
  if (from === to) return { ok: false, error: { status: 400, code: 'stage.unchanged', message: `The product is already in ${stageName(to)}.` } };
  if (!isMoveAllowed(from, to)) {
    const next = productStages[indexOf(from) + 1];
    return {
      ok: false,
      error: { status: 400, code: 'stage.not_allowed', message: `A product moves forward one stage at a time: from ${stageName(from)} the next stage is ${stageName(next)}, not ${stageName(to)}.` },
    };
  }
  if (!needsApprovedSample(from, to) || req.latestSampleVerdict === 'approved') return { ok: true, override: false };
  if (!req.override) return { ok: false, error: { status: 409, code: 'stage.needs_approved_sample', message: gateMessage(req.latestSampleVerdict) } };
  if (!req.mayOverride) return { ok: false, error: { status: 403, code: 'stage.override_forbidden', message: 'Only an owner may move a product past the sample check.' } };
  if (req.note.trim() === '') return { ok: false, error: { status: 400, code: 'stage.override_needs_note', message: 'Say why the product may skip the sample check: a note is required.' } };
  return { ok: true, override: true };
}
