import { Button } from '../../../components/ui/button';
import { describeSaveStatus, type Autosaver } from '../autosave';
import { useSaveStatus } from './use-editor-state';

export function SaveStatusBar({ autosaver, onReload, reloading }: { autosaver: Autosaver; onReload: () => void; reloading: boolean }) {
  const status = useSaveStatus(autosaver);
  if (status.kind === 'conflict') {
    return (
      <div role="alert" className="flex items-center gap-3 rounded-md border border-rust bg-[#fbeae5] px-3 py-1.5 text-sm text-ink">
        <span>{status.message}</span>
        <Button size="sm" variant="danger" busy={reloading} onClick={onReload}>Reload</Button>
      </div>
    );
  }
  return (
    <div role="status" aria-live="polite" data-testid="save-status" className={status.kind === 'error' ? 'flex items-center gap-2 text-sm text-rust' : 'text-sm text-ink-soft'}>
      {describeSaveStatus(status)}
      {status.kind === 'error' && <Button size="sm" variant="secondary" onClick={() => void autosaver.flush()}>Try again</Button>}
    </div>
  );
}
