type Dated = { createdAt: Date | string; productRevision: number };
const time = (d: Date | string) => (typeof d === 'string' ? Date.parse(d) : d.getTime());

export type ReviewStatus = 'none' | 'requested' | 'approved' | 'changes_requested';

/**
 * A product's review state: the latest decision on its current revision counts; a decision on
 * an older revision no longer does (the layout changed since). Without one, a request made
 * after the last decision means the review is waiting.
 */
export function reviewStateOf<R extends Dated, D extends Dated & { decision: 'approved' | 'changes_requested' }>(input: {
  revision: number;
  requests: readonly R[];
  decisions: readonly D[];
}): { status: ReviewStatus; decision: D | null; openRequest: R | null } {
  const newest = <T extends Dated>(rows: readonly T[]) => rows.reduce<T | null>((best, r) => (!best || time(r.createdAt) > time(best.createdAt) ? r : best), null);
  const lastDecision = newest(input.decisions);
  const lastRequest = newest(input.requests);
  const openRequest = lastRequest && (!lastDecision || time(lastRequest.createdAt) > time(lastDecision.createdAt)) ? lastRequest : null;
  const current = newest(input.decisions.filter((d) => d.productRevision === input.revision));
  if (current && (!openRequest || time(current.createdAt) > time(openRequest.createdAt))) return { status: current.decision, decision: current, openRequest: null };
  return { status: openRequest ? 'requested' : 'none', decision: null, openRequest };
}
