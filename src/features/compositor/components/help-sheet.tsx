import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import type { ProductEditor } from '../editor';
import { shortcutList } from '../tools/keyboard';
import { useEditorSelector } from './use-editor-state';

export function HelpSheet({ editor }: { editor: ProductEditor }) {
  const helpOpen = useEditorSelector(editor, (s) => s.helpOpen);
  const close = () => editor.setHelpOpen(false);
  return (
    <Dialog open={helpOpen} onClose={close} title="Keyboard shortcuts" actions={<Button data-autofocus onClick={close}>Close</Button>}>
      <table className="w-full text-sm">
        <tbody>
          {shortcutList.map((s) => (
            <tr key={s.keys} className="border-b border-sand last:border-0">
              <th scope="row" className="py-1.5 pr-4 text-left font-semibold whitespace-nowrap">{s.keys}</th>
              <td className="py-1.5">{s.does}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </Dialog>
  );
}
