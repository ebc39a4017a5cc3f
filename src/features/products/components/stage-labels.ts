import type { ProductStage } from '@shared/contracts/stages';
import type { BadgeTone } from '../../../components/ui/badge';

export const stageLabels: Record<ProductStage, string> = {
  idea: 'Idea',
  drafting: 'Drafting',
  proofing: 'Proofing',
  sampling: 'Sampling',
  ready: 'Ready',
  listed: 'Listed',
  retired: 'Retired',
};

export const stageTones: Record<ProductStage, BadgeTone> = {
  idea: 'neutral',
  drafting: 'neutral',
  proofing: 'tide',
  sampling: 'ochre',
  ready: 'kelp',
  listed: 'kelp',
  retired: 'neutral',
};

export const verdictLabels = { pending: 'Sample awaiting verdict', approved: 'Sample approved', changes_needed: 'Sample needs changes' } as const;
