import { templatePixelSize } from '@shared/templates/template-geometry';
import type { Template } from '@shared/templates/template-schema';
import { kindOptions } from './components/template-basic-fields';

const round = (n: number) => Number(n.toFixed(3)).toString();

export const kindLabel = (kind: Template['kind']) => kindOptions.find((k) => k.value === kind)?.label ?? kind;

/** "5 × 7 in trim · 1575 × 2175 px at 300 DPI" */
export function templateSummary(t: Template): string {
  const px = templatePixelSize(t);
  return `${round(t.size.width)} × ${round(t.size.height)} ${t.unit} trim · ${px.width} × ${px.height} px at ${t.dpi} DPI`;
}
