import type { RightsStatusDto } from '@shared/contracts/motifs';
import type { BadgeTone } from '../../components/ui/badge';

export const rightsWords: Record<RightsStatusDto, { label: string; tone: BadgeTone }> = {
  own_work: { label: 'Own work', tone: 'kelp' },
  licensed: { label: 'Licensed', tone: 'tide' },
  public_domain: { label: 'Public domain', tone: 'neutral' },
  unknown: { label: 'Rights not known', tone: 'ochre' },
};

export const rightsOptions = (Object.keys(rightsWords) as RightsStatusDto[]).map((value) => ({ value, label: rightsWords[value].label }));
