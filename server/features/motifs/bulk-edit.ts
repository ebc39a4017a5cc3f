import { param, sql, type SQL } from 'drizzle-orm';
import type { BulkAction } from '../../../shared/contracts/motifs';
import type { Database } from '../../db/client';
import { recordLibraryChange } from './library-changes';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];
export type BulkOutcome = { matched: number; changed: number; changedIds: string[] };

// Tags in their first-seen order without repeats.
const dedupedTags = (expr: SQL) => sql`coalesce((select array_agg(t order by n) from (select t, min(n) as n from unnest(${expr}) with ordinality as u(t, n) group by t) as d), '{}'::text[])`;

// One statement per action whatever the number of motifs: the selection is a CTE of this
// studio's motifs among the ids, so ids of other studios simply match nothing.
function actionStatement(studioId: string, ids: readonly string[], action: Exclude<BulkAction, { type: 'add-to-collection' | 'remove-from-collection' }>): SQL {
  const selected = sql`select id from motifs where studio_id = ${studioId}::uuid and id = any(${param(ids)}::uuid[])`;
  const update = (set: SQL, needsChange: SQL) => sql`
    with sel as (${selected}),
    upd as (update motifs m set ${set}, updated_at = now() from sel where m.id = sel.id and ${needsChange} returning m.id)
    select (select count(*) from sel)::int as matched, coalesce((select array_agg(id)::text[] from upd), '{}') as changed`;
  switch (action.type) {
    case 'tag': {
      const tags = sql`${param(action.tags)}::text[]`;
      return update(sql`tags = ${dedupedTags(sql`m.tags || ${tags}`)}`, sql`not (m.tags @> ${tags})`);
    }
    case 'untag': {
      const tags = sql`${param(action.tags)}::text[]`;
      return update(sql`tags = coalesce(array(select t from unnest(m.tags) as t where not (t = any(${tags}))), '{}')`, sql`m.tags && ${tags}`);
    }
    case 'set-rights': {
      const r = action.rights;
      const sets: SQL[] = [];
      const differs: SQL[] = [];
      const field = (column: string, value: string | boolean | undefined) => {
        if (value === undefined) return;
        sets.push(sql`${sql.identifier(column)} = ${value}`);
        differs.push(sql`m.${sql.identifier(column)} is distinct from ${value}`);
      };
      field('rights_status', r.status);
      field('rights_source', r.source);
      field('rights_licence', r.licence);
      field('attribution_required', r.attributionRequired);
      return update(sql.join(sets, sql`, `), sql`(${sql.join(differs, sql` or `)})`);
    }
    case 'archive':
      return update(sql`archived = true`, sql`not m.archived`);
    case 'unarchive':
      return update(sql`archived = false`, sql`m.archived`);
  }
}

function membershipStatement(studioId: string, ids: readonly string[], collectionId: string, add: boolean): SQL {
  const selected = sql`select id from motifs where studio_id = ${studioId}::uuid and id = any(${param(ids)}::uuid[])`;
  const change = add
    ? sql`insert into collection_motifs (collection_id, motif_id) select ${collectionId}::uuid, id from sel on conflict do nothing returning motif_id`
    : sql`delete from collection_motifs cm using sel where cm.collection_id = ${collectionId}::uuid and cm.motif_id = sel.id returning cm.motif_id`;
  return sql`
    with sel as (${selected}), chg as (${change})
    select (select count(*) from sel)::int as matched, coalesce((select array_agg(motif_id)::text[] from chg), '{}') as changed`;
}

export async function runBulkAction(tx: Tx, studioId: string, ids: readonly string[], action: BulkAction): Promise<BulkOutcome> {
  const statement =
    action.type === 'add-to-collection' || action.type === 'remove-from-collection'
      ? membershipStatement(studioId, ids, action.collectionId, action.type === 'add-to-collection')
      : actionStatement(studioId, ids, action);
  const result = await tx.execute<{ matched: number; changed: string[] }>(statement);
  const row = result.rows[0];
  const changedIds = row?.changed ?? [];
  if (changedIds.length) await recordLibraryChange(tx, studioId, changedIds);
  return { matched: row?.matched ?? 0, changed: changedIds.length, changedIds };
}
