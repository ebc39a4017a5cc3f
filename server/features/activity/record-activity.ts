import type { ActivityKind, ActivitySubjectType } from '../../../shared/contracts/activity';
import type { Database } from '../../db/client';
import { activityEvents } from '../../db/schema/index';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

export type ActivityInput = {
  studioId: string;
  actorId: string | null;
  kind: ActivityKind;
  subjectType: ActivitySubjectType;
  subjectId: string | null;
  // plain words for the feed, e.g. 'moved "Puffin Picnic mug" to sampling'
  summary: string;
  data?: Record<string, unknown>;
};

// Call inside the transaction that made the change, so the feed never lists what was rolled back.
export async function recordActivity(db: Database | Tx, input: ActivityInput): Promise<void> {
  await db.insert(activityEvents).values({ ...input, data: input.data ?? {} });
}
