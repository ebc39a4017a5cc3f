import { can, type StudioRole } from '../../../shared/auth/permissions';
import type { StageMove } from '../../../shared/contracts/stages';
import { decideStageMove } from '../../../shared/stages/stage-rules';
import type { ProductStage } from '../../db/schema/products';
import { HttpError, notFound } from '../../lib/http-error';
import type { StageMoveRow, StagesRepository } from './stages.repository';

function view(row: StageMoveRow): StageMove {
  return {
    id: row.id,
    fromStage: row.fromStage,
    toStage: row.toStage,
    note: row.note,
    override: row.override,
    movedBy: row.movedBy ? { id: row.movedBy, name: row.movedByName ?? 'Former member' } : null,
    createdAt: row.createdAt.toISOString(),
  };
}

export function createStagesService(repo: StagesRepository) {
  return {
    async move(actor: { studioId: string; userId: string; role: StudioRole }, productId: string, input: { to: ProductStage; note: string; override: boolean }) {
      const row = await repo.move({ studioId: actor.studioId, productId, to: input.to, note: input.note, userId: actor.userId }, (from, verdict) => {
        const decision = decideStageMove({ from, to: input.to, latestSampleVerdict: verdict, note: input.note, override: input.override, mayOverride: can(actor.role, 'stages.override') });
        if (!decision.ok) throw new HttpError(decision.error.status, decision.error.code, decision.error.message);
        return decision;
      });
      if (!row) throw notFound('That product');
      return { stage: row.toStage, move: view(row) };
    },
    async history(studioId: string, productId: string) {
      if (!(await repo.productStage(studioId, productId))) throw notFound('That product');
      return { moves: (await repo.history(studioId, productId)).map(view) };
    },
  };
}

export type StagesService = ReturnType<typeof createStagesService>;
