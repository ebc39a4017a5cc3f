import { card5x7Front, cardA6, printA3, printA4, stickerSheet, totePanel } from './built-in-flat';
import { enamelCampMug, mug11oz, mug15oz } from './built-in-mugs';
import type { Template } from './template-schema';

export { card5x7Front, cardA6, printA3, printA4, stickerSheet, totePanel, enamelCampMug, mug11oz, mug15oz };

/** Presets of common blanks, as starting points the studio adjusts to its printer's figures. */
export const builtInTemplates: readonly Template[] = [mug11oz, mug15oz, enamelCampMug, card5x7Front, cardA6, totePanel, printA4, printA3, stickerSheet];

export function findBuiltInTemplate(id: string): Template | undefined {
  return builtInTemplates.find((t) => t.id === id);
}
