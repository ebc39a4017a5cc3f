import { useEffect, useState } from 'react';
import { Spinner } from '../../../components/ui/spinner';
import { useSoftProof, type SoftProofImage } from '../api/get-soft-proof';
import type { ProductEditor } from '../editor';

export type SoftProofView = {
  on: boolean;
  setOn: (on: boolean) => void;
  mask: boolean;
  setMask: (mask: boolean) => void;
  proof: SoftProofImage | undefined;
  loading: boolean;
  error: Error | null;
};

/**
 * "As printed": while on, the canvas draws the server's soft proof of the saved design (through
 * the press profile) instead of the artwork, optionally striping the colours that shift.
 */
export function useSoftProofView(editor: ProductEditor, productId: string, savedRevision: number): SoftProofView {
  const [on, setOn] = useState(false);
  const [mask, setMask] = useState(true);
  const query = useSoftProof(productId, savedRevision, mask, on);
  const bitmap = on ? query.data?.bitmap ?? null : null;
  useEffect(() => {
    editor.setPrintView(bitmap);
  }, [editor, bitmap]);
  useEffect(() => () => editor.setPrintView(null), [editor]);
  return { on, setOn, mask, setMask, proof: query.data, loading: query.isFetching, error: query.error };
}

export function SoftProofToggle({ view }: { view: SoftProofView }) {
  return (
    <div className="flex items-center gap-3 text-sm" role="group" aria-label="Print simulation">
      <label className="flex items-center gap-1.5" title="Shows the saved design as the press would print it, through a CMYK profile">
        <input type="checkbox" checked={view.on} onChange={(e) => view.setOn(e.target.checked)} />
        As printed
      </label>
      {view.on && (
        <label className="flex items-center gap-1.5">
          <input type="checkbox" checked={view.mask} onChange={(e) => view.setMask(e.target.checked)} />
          Stripe colour shifts
        </label>
      )}
      {view.on && view.loading && <Spinner className="size-4 text-tide" />}
    </div>
  );
}

/** Said on the canvas while the simulation shows: what it is, and how current it is. */
export function SoftProofNotice({ view, unsaved }: { view: SoftProofView; unsaved: boolean }) {
  const { proof, error } = view;
  return (
    <div role="status" data-testid="soft-proof-notice" className="pointer-events-none absolute top-2 left-2 z-10 max-w-[32rem] rounded-md border border-sand bg-paper/95 px-3 py-2 text-xs text-ink shadow">
      <p className="font-semibold">Print simulation — colours are approximate</p>
      {error ? <p className="text-rust">{`The simulation could not be made: ${error.message}`}</p> : (
        <p>
          {proof ? `A simulation of ${proof.profileName}. ` : 'Preparing the simulation… '}
          {proof && `${(proof.share * 100).toFixed(1)} % of the design shifts by more than ΔE00 5${view.mask ? ' (striped)' : ''}. `}
          {unsaved ? 'It shows the last save; your latest changes appear once they are saved.' : 'It shows the saved design.'}
        </p>
      )}
    </div>
  );
}
