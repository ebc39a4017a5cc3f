import { and, eq, sql } from 'drizzle-orm';
import { getTableColumns } from 'drizzle-orm';
import type { StudioDataDocument, StudioDataImportReport } from '../../../shared/contracts/studio-data';
import type { Database } from '../../db/client';
import { collections, memberships, motifs, originals, products, studios, users } from '../../db/schema/index';
import { badRequest, conflict, HttpError, notFound } from '../../lib/http-error';
import type { ObjectStorage } from '../../lib/storage';
import { recordActivity } from '../activity/record-activity';
import { recordLibraryChange } from '../motifs/library-changes';
import { planImport } from './import-plan';
import { sectionSpecs } from './section-specs';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];
type Deps = { db: Database; storage: ObjectStorage };
type Caller = { studioId: string; userId: string };

// 60,000 bind parameters per statement keeps under Postgres's 65,535.
const MAX_PARAMS = 60_000;
const COPY_CONCURRENCY = 4;

async function assertEmpty(db: Database | Tx, studioId: string) {
  const [row] = await db.execute<{ n: number }>(sql`
    select (select count(*) from ${originals} where ${originals.studioId} = ${studioId})
         + (select count(*) from ${motifs} where ${motifs.studioId} = ${studioId})
         + (select count(*) from ${products} where ${products.studioId} = ${studioId})
         + (select count(*) from ${collections} where ${collections.studioId} = ${studioId}) as n`).then((r) => r.rows);
  if (Number(row?.n ?? 0) > 0) {
    throw conflict('studio.not_empty', 'This studio already has originals, motifs, products or collections. Import into a new, empty studio.');
  }
}

// People of the file are matched by e-mail to members of this studio; nobody is added.
async function matchPeople(db: Database, studioId: string, doc: StudioDataDocument) {
  const here = await db
    .select({ userId: users.id, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.studioId, studioId));
  const byEmail = new Map(here.map((m) => [m.email.toLowerCase(), m.userId]));
  const people = new Map<string, string>();
  const matched: StudioDataImportReport['matchedPeople'] = [];
  const unmatched: StudioDataImportReport['unmatchedPeople'] = [];
  for (const m of doc.members) {
    const userId = byEmail.get(m.email.toLowerCase());
    if (userId) {
      people.set(m.userId.toLowerCase(), userId);
      matched.push({ email: m.email, name: m.name });
    } else unmatched.push({ email: m.email, name: m.name });
  }
  return { people, matched, unmatched };
}

// Objects are copied only from a studio the caller owns in this same deployment, and only keys
// under that studio's own prefix: a file cannot reach into anyone else's storage.
async function copyObjects(deps: Deps, caller: Caller, doc: StudioDataDocument, keys: Map<string, string>) {
  const source = doc.source.studioId.toLowerCase();
  const [membership] = await deps.db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.studioId, source), eq(memberships.userId, caller.userId)))
    .limit(1);
  const readable = membership?.role === 'owner' && source !== caller.studioId;
  const copied: string[] = [];
  const missing: StudioDataImportReport['missingObjects'] = [];
  const queue = [...keys.entries()];
  async function next(): Promise<void> {
    const item = queue.shift();
    if (!item) return;
    const [from, to] = item;
    if (!readable) missing.push({ key: from, reason: 'The studio this file came from is not one you own on this server, so its files cannot be copied.' });
    else if (!from.startsWith(`studios/${source}/`)) missing.push({ key: from, reason: 'This key is outside the source studio\'s storage.' });
    else if (!(await deps.storage.exists(from))) missing.push({ key: from, reason: 'Not found in storage.' });
    else {
      const object = await deps.storage.get(from);
      await deps.storage.put(to, object.body, object.contentType ?? 'application/octet-stream');
      copied.push(to);
    }
    return next();
  }
  try {
    await Promise.all(Array.from({ length: COPY_CONCURRENCY }, next));
  } catch (err) {
    await deps.storage.remove(copied).catch(() => {});
    throw err;
  }
  return { copied, missing };
}

function databaseProblem(err: unknown): HttpError | null {
  const e = err as { code?: string; constraint?: string; column?: string; cause?: { code?: string; constraint?: string; column?: string } };
  const pg = e?.code ? e : e?.cause;
  if (pg?.code === '23505') return conflict('studio_data.conflict', `Two records of the file collide (${pg.constraint ?? 'a unique rule'}); nothing was imported.`);
  if (pg?.code === '23502') return badRequest('studio_data.invalid', `A record of the file is missing "${pg.column ?? 'a required value'}"; nothing was imported.`);
  if (pg?.code === '23503' || pg?.code === '22P02' || pg?.code === '23514') return badRequest('studio_data.invalid', 'A record of the file does not fit this server\'s tables; nothing was imported.');
  return null;
}

export async function importStudioData(deps: Deps, caller: Caller, doc: StudioDataDocument): Promise<StudioDataImportReport> {
  const { db } = deps;
  await assertEmpty(db, caller.studioId);
  const { people, matched, unmatched } = await matchPeople(db, caller.studioId, doc);
  const plan = planImport({ doc, targetStudioId: caller.studioId, people });
  const { copied, missing } = await copyObjects(deps, caller, doc, plan.keys);
  const imported: Record<string, number> = {};
  try {
    await db.transaction(async (tx) => {
      // one import at a time per studio; the emptiness check again, under the lock
      const [locked] = await tx.select({ id: studios.id }).from(studios).where(eq(studios.id, caller.studioId)).for('update');
      if (!locked) throw notFound('That studio');
      await assertEmpty(tx, caller.studioId);
      for (const spec of sectionSpecs) {
        const rows = plan.rows.get(spec.section) ?? [];
        imported[spec.section] = rows.length;
        const perChunk = Math.max(1, Math.floor(MAX_PARAMS / Object.keys(getTableColumns(spec.table)).length));
        for (let i = 0; i < rows.length; i += perChunk) await tx.insert(spec.table).values(rows.slice(i, i + perChunk));
      }
      await tx
        .update(studios)
        .set({
          paletteLimit: doc.studio.paletteLimit,
          readyWeeksBeforeLaunch: doc.studio.readyWeeksBeforeLaunch,
          salesColumnMapping: doc.studio.salesColumnMapping,
          salesSplitRule: doc.studio.salesSplitRule,
        })
        .where(eq(studios.id, caller.studioId));
      await recordActivity(tx, {
        studioId: caller.studioId,
        actorId: caller.userId,
        kind: 'studio.data_imported',
        subjectType: 'studio',
        subjectId: caller.studioId,
        summary: `imported the data of "${doc.source.studioName}" (exported ${doc.exportedAt.slice(0, 10)})`,
        data: { imported, objectsCopied: copied.length, missingObjects: missing.length, unmatchedPeople: unmatched.length },
      });
      await recordLibraryChange(tx, caller.studioId, null);
    });
  } catch (err) {
    // Motif objects are keyed by their content: when another import filled the studio meanwhile,
    // the same keys are now its objects, so only this import's own per-record keys go.
    const filled = await assertEmpty(db, caller.studioId).then(() => false, () => true);
    const shared = `studios/${caller.studioId}/motifs/`;
    await deps.storage.remove(filled ? copied.filter((k) => !k.startsWith(shared)) : copied).catch(() => {});
    throw databaseProblem(err) ?? err;
  }
  const notes = [...plan.notes, 'The studio keeps its own name; its settings (palette limit, weeks before launch, sales columns and split) come from the file.'];
  if (unmatched.length > 0) notes.push(`${unmatched.length} person(s) of the file are not members here: what they did is kept with nobody named. Invite them, then nothing more is needed for new work.`);
  return { imported, matchedPeople: matched, unmatchedPeople: unmatched, objectsCopied: copied.length, missingObjects: missing, notes };
}
