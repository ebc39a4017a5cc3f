import { z } from 'zod';
import { productStages, productStageSchema } from './products';

export { productStages, productStageSchema };
export type ProductStage = (typeof productStages)[number];

export const moveStageRequestSchema = z.object({
  to: productStageSchema,
  note: z.string().trim().max(2000, 'Keep the note under 2,000 characters').default(''),
  // an owner moving a product to ready without an approved sample; needs a note
  override: z.boolean().default(false),
});
export type MoveStageRequest = z.input<typeof moveStageRequestSchema>;

export const stageMoveSchema = z.object({
  id: z.string(),
  fromStage: productStageSchema.nullable(),
  toStage: productStageSchema,
  note: z.string(),
  override: z.boolean(),
  movedBy: z.object({ id: z.string(), name: z.string() }).nullable(),
  createdAt: z.string(),
});
export type StageMove = z.infer<typeof stageMoveSchema>;

export const stageHistorySchema = z.object({ moves: z.array(stageMoveSchema) });
export const moveStageResponseSchema = z.object({ stage: productStageSchema, move: stageMoveSchema });
