import { duplicatePlacements, nudgePlacements, removePlacements, reorderPlacements } from '@shared/scene';
import type { ProductEditor } from '../editor';
import { zoomStep } from '../viewport';
import type { EditorCommand } from './keyboard';
import type { SelectTool } from './select-tool';

export type CommandContext = { tool: SelectTool; screen: { width: number; height: number } };

/** Carries out a shortcut; returns false when it did nothing, so the key keeps its usual meaning. */
export function runCommand(editor: ProductEditor, command: EditorCommand, ctx: CommandContext): boolean {
  const ids = editor.selection;
  switch (command.type) {
    case 'nudge':
      if (ids.length === 0) return false;
      editor.change((l) => nudgePlacements(l, ids, command.direction, command.stepPx));
      return true;
    case 'delete':
      if (ids.length === 0) return false;
      editor.change((l) => removePlacements(l, ids), []);
      return true;
    case 'undo':
      editor.undo();
      return true;
    case 'redo':
      editor.redo();
      return true;
    case 'duplicate': {
      if (ids.length === 0) return false;
      let copies: string[] = [];
      editor.change((l) => {
        const result = duplicatePlacements(l, ids);
        copies = result.ids;
        return result.layout;
      });
      editor.select(copies);
      return true;
    }
    case 'select-all':
      editor.select(editor.layout.placements.filter((p) => !p.hidden).map((p) => p.id));
      return true;
    case 'reorder':
      if (ids.length === 0) return false;
      editor.change((l) => reorderPlacements(l, ids, command.move));
      return true;
    case 'zoom':
      editor.setViewport(zoomStep(editor.viewport, command.direction, { x: ctx.screen.width / 2, y: ctx.screen.height / 2 }));
      return true;
    case 'fit':
      editor.fit(ctx.screen);
      return true;
    case 'help':
      editor.setHelpOpen(true);
      return true;
    case 'escape':
      if (ctx.tool.cancel()) return true;
      if (editor.getState().helpOpen) editor.setHelpOpen(false);
      else editor.select([]);
      return true;
  }
}
