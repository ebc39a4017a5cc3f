import { and, eq } from 'drizzle-orm';
import { copyFile, mkdir } from 'node:fs/promises';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { getConfig } from '../../server/config';
import { memberships, originals, studios, users } from '../../server/db/schema/index';
import { createOriginalImporter } from '../../server/features/originals/import-original';
import { createOriginalsCleanup } from '../../server/features/originals/originals-cleanup';
import { createOriginalsRepository } from '../../server/features/originals/originals.repository';
import { createOriginalsService } from '../../server/features/originals/originals.service';
import { runUnpack } from '../../server/features/originals/unpack/run-unpack';
import { hashPassword } from '../../server/lib/passwords';
import { openRuntime, type Runtime } from '../../server/runtime';
import { drawDemoOriginals } from '../demo/draw-originals';
import { demoAccounts, demoPassword, demoStudioName } from './demo-accounts';
import { seedDemoLife } from './demo-life';

async function ensureTeam(runtime: Runtime): Promise<{ studioId: string; ownerId: string }> {
  const db = runtime.db.db;
  const owner = demoAccounts.find((a) => a.role === 'owner')!;
  const [existing] = await db
    .select({ studioId: studios.id, ownerId: users.id })
    .from(users)
    .innerJoin(memberships, eq(memberships.userId, users.id))
    .innerJoin(studios, eq(studios.id, memberships.studioId))
    .where(and(eq(users.email, owner.email), eq(studios.name, demoStudioName)))
    .limit(1);
  if (existing) return existing;
  const passwordHash = await hashPassword(demoPassword);
  return db.transaction(async (tx) => {
    const [studio] = await tx.insert(studios).values({ name: demoStudioName }).returning();
    let ownerId = '';
    for (const account of demoAccounts) {
      const [user] = await tx
        .insert(users)
        .values({ name: account.name, email: account.email, passwordHash })
        .onConflictDoUpdate({ target: users.email, set: { name: account.name } })
        .returning();
      await tx.insert(memberships).values({ studioId: studio.id, userId: user.id, role: account.role }).onConflictDoNothing();
      if (account.role === 'owner') ownerId = user.id;
    }
    return { studioId: studio.id, ownerId };
  });
}

// Demo originals go through the real pipeline: stored unchanged, queued, unpacked, committed.
async function ensureOriginals(runtime: Runtime, studioId: string, ownerId: string) {
  const repo = createOriginalsRepository(runtime.db.db);
  const service = createOriginalsService({ repo, storage: runtime.storage, queue: runtime.queue, cleanup: createOriginalsCleanup(runtime.db.db, runtime.storage) });
  const importOriginal = createOriginalImporter({ db: runtime.db.db, repo, storage: runtime.storage, runUnpack });
  const present = await runtime.db.db.select({ name: originals.name, status: originals.status }).from(originals).where(eq(originals.studioId, studioId));
  const demoDir = path.resolve(runtime.config.STORAGE_DIR, 'demo');
  await mkdir(demoDir, { recursive: true });
  const drawn = await drawDemoOriginals(demoDir);
  for (const file of drawn) {
    const fileName = path.basename(file.file);
    if (present.some((p) => p.name === fileName && p.status !== 'failed')) continue;
    const uploadCopy = path.join(demoDir, `${fileName}.upload`);
    await copyFile(file.file, uploadCopy);
    const { size } = await import('node:fs/promises').then((fs) => fs.stat(uploadCopy));
    const { id } = await service.upload({ studioId, userId: ownerId, filePath: uploadCopy, fileName, byteSize: size, cut: 'groups' });
    const outcome = await importOriginal(id);
    console.log(`  imported ${file.name}: ${outcome}`);
  }
}

export async function seedDemo(): Promise<void> {
  const runtime = await openRuntime(getConfig());
  try {
    const { studioId, ownerId } = await ensureTeam(runtime);
    await ensureOriginals(runtime, studioId, ownerId);
    await seedDemoLife(runtime, studioId);
    console.log(`Demo studio "${demoStudioName}" is ready.`);
  } finally {
    await runtime.close();
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  seedDemo().catch((err) => {
    console.error('Seeding the demo studio failed:', err);
    process.exit(1);
  });
}
