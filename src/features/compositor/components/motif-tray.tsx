import { useState, type KeyboardEvent } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { LibraryMotif } from '@shared/contracts/motifs';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select-field';
import { Spinner } from '../../../components/ui/spinner';
import { originalForPlacingQueryOptions, useTrayOriginals } from '../api/get-tray-originals';
import { useTrayMotifs } from '../api/get-tray-motifs';
import type { OriginalMotif, PlaceableMotif } from '../place-motifs';
import { thumbUrl } from '../render/image-cache';
import { writeMotifDrag } from './tray-drag';

type MotifTrayProps = {
  onPlace: (motif: PlaceableMotif) => void;
  onPlaceOriginal: (motifs: OriginalMotif[]) => void;
  /** The original most of the product's placements come from, offered first. */
  usualOriginalId?: string;
};

/** The studio's motifs beside the canvas: drag one onto the strip, or press Enter to place it at the front. */
export function MotifTray({ onPlace, onPlaceOriginal, usualOriginalId }: MotifTrayProps) {
  const [q, setQ] = useState('');
  const motifs = useTrayMotifs(q);
  const list = motifs.data?.motifs ?? [];

  const onKey = (e: KeyboardEvent, m: LibraryMotif) => {
    if (e.key === 'Enter' || e.key === ' ') {
      e.preventDefault();
      onPlace(m);
    }
  };

  return (
    <aside aria-label="Motifs" className="flex min-h-0 flex-col gap-3 rounded-bl-lg border-r border-sand bg-paper p-3">
      <label className="block text-sm font-semibold text-ink">
        Find motifs
        <input
          type="search"
          value={q}
          onChange={(e) => setQ(e.target.value)}
          placeholder="puffin, kite, wave…"
          className="mt-1 block w-full rounded-md border border-sand bg-white px-2 py-1.5 text-base font-normal"
        />
      </label>
      <PlaceAsInOriginal onPlaceOriginal={onPlaceOriginal} usualOriginalId={usualOriginalId} />
      <p className="text-xs text-ink-soft">Drag a motif onto the product, or pick it and press Enter to place it at the front.</p>
      <div className="min-h-0 flex-1 overflow-y-auto">
        {motifs.isPending && <Spinner />}
        {motifs.isError && <p className="text-sm text-rust">{motifs.error.message}</p>}
        {motifs.isSuccess && list.length === 0 && <p className="text-sm text-ink-soft">No motifs match “{q}”.</p>}
        <ul className="grid grid-cols-2 gap-2" aria-label="Motifs to place">
          {list.map((m) => (
            <li key={m.id}>
              <button
                type="button"
                draggable
                onDragStart={(e) => writeMotifDrag(e.dataTransfer, m)}
                onKeyDown={(e) => onKey(e, m)}
                onDoubleClick={() => onPlace(m)}
                title={`${m.name} — ${m.width} × ${m.height} px`}
                className="flex w-full flex-col items-center gap-1 rounded-md border border-sand bg-white p-1.5 text-left hover:border-tide focus-visible:border-tide"
              >
                <img src={thumbUrl(m.id, m.version)} alt="" className="h-20 w-full object-contain" draggable={false} loading="lazy" />
                <span className="w-full truncate text-xs text-ink">{m.name}</span>
              </button>
            </li>
          ))}
        </ul>
      </div>
    </aside>
  );
}

function PlaceAsInOriginal({ onPlaceOriginal, usualOriginalId }: Pick<MotifTrayProps, 'onPlaceOriginal' | 'usualOriginalId'>) {
  const originals = useTrayOriginals();
  const queryClient = useQueryClient();
  const [picked, setPicked] = useState('');
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const ready = (originals.data?.originals ?? []).filter((o) => o.status === 'ready' && o.motifCount > 0);
  if (ready.length === 0) return null;
  const chosen = picked || (ready.find((o) => o.id === usualOriginalId) ?? ready[0]).id;

  const place = async () => {
    setBusy(true);
    setProblem(null);
    try {
      const original = await queryClient.fetchQuery(originalForPlacingQueryOptions(chosen));
      onPlaceOriginal(original.motifs);
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The original could not be loaded');
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="rounded-md border border-sand p-2">
      <label className="block text-sm font-semibold text-ink">
        An original’s motifs
        <Select
          value={chosen}
          onChange={(e) => setPicked(e.target.value)}
          options={ready.map((o) => ({ value: o.id, label: o.name }))}
          className="mt-1 border-sand text-sm"
        />
      </label>
      <Button size="sm" variant="secondary" className="mt-2 w-full" busy={busy} onClick={place}>
        Place as in the original
      </Button>
      {problem && <p className="mt-1 text-xs text-rust">{problem}</p>}
    </div>
  );
}
