import { useCallback, useEffect, useRef, useState } from 'react';
import type { Vec } from '@shared/geometry';
import { addPlacement, type Layout } from '@shared/scene';
import type { ProductDetail } from '@shared/contracts/products';
import { isApiRequestError } from '../../../lib/api-client';
import { useGuideImage } from '../api/get-guide-image';
import { Autosaver } from '../autosave';
import { useSettledRevision } from '../preflight/use-settled-revision';
import { ProductEditor } from '../editor';
import { frontCentre, placementForMotif, placementsAsInOriginal, usualOriginalOf, type OriginalMotif, type PlaceableMotif } from '../place-motifs';
import type { LoadThumb } from '../render/image-cache';
import { EditorCanvas } from './editor-canvas';
import { EditorToolbar } from './editor-toolbar';
import { HelpSheet } from './help-sheet';
import { Inspector } from './inspector';
import { MotifTray } from './motif-tray';
import { NewerVersions } from './newer-versions';
import { PreflightPanel } from './preflight-panel';
import { SaveStatusBar } from './save-status';
import { SoftProofNotice, SoftProofToggle, useSoftProofView } from './soft-proof-toggle';
import { useSaveStatus } from './use-editor-state';
import { WrapPreview } from './wrap-preview';

export type ProductEditorProps = {
  product: ProductDetail;
  save: (layout: Layout, revision: number) => Promise<{ revision: number }>;
  /** Fetches the product again after a conflict. */
  reload: () => Promise<ProductDetail>;
  loadThumb?: LoadThumb;
};

const toFailure = (error: unknown) =>
  isApiRequestError(error) ? { code: error.code, message: error.message } : { code: 'save.failed', message: 'The product could not be saved; check your connection.' };

/** The editor page's body: tray, canvas and inspector around one ProductEditor with autosave. */
export function ProductEditorView({ product, save, reload, loadThumb }: ProductEditorProps) {
  const [editor] = useState(() => new ProductEditor(product.template, product.layout));
  const [autosaver] = useState(() => new Autosaver(product.layout, product.revision, save, toFailure));
  const [reloading, setReloading] = useState(false);
  const canvasBox = useRef<HTMLDivElement>(null);
  const saveStatus = useSaveStatus(autosaver);
  // the server's checks and the soft proof look at what was saved, so they follow the saved revision
  const savedRevision = useSettledRevision(saveStatus.revision);
  const softProof = useSoftProofView(editor, product.id, savedRevision);
  const guideImage = useGuideImage(product.templateId);
  useEffect(() => editor.setGuideImage(guideImage), [editor, guideImage]);

  useEffect(() => {
    let last = editor.getState().committedLayout;
    const off = editor.subscribe(() => {
      const next = editor.getState().committedLayout;
      if (next !== last) {
        last = next;
        autosaver.changed(next);
      }
    });
    const beforeUnload = (e: BeforeUnloadEvent) => {
      if (!autosaver.hasUnsavedChanges) return;
      void autosaver.flush();
      e.preventDefault();
    };
    window.addEventListener('beforeunload', beforeUnload);
    return () => {
      off();
      window.removeEventListener('beforeunload', beforeUnload);
      void autosaver.flush();
      autosaver.dispose();
    };
  }, [editor, autosaver]);

  const screen = useCallback(() => {
    const r = canvasBox.current?.getBoundingClientRect();
    return { width: r?.width ?? 800, height: r?.height ?? 500 };
  }, []);

  const place = useCallback((motif: PlaceableMotif, at?: Vec) => {
    const p = placementForMotif(motif, at ?? frontCentre(editor.geometry), editor.geometry);
    editor.change((l) => addPlacement(l, p), [p.id]);
  }, [editor]);

  const placeOriginal = useCallback((motifs: OriginalMotif[]) => {
    const ps = placementsAsInOriginal(motifs, editor.geometry);
    if (ps.length === 0) return;
    editor.change((l) => ps.reduce((acc, p) => addPlacement(acc, p), l), ps.map((p) => p.id));
  }, [editor]);

  const onReload = async () => {
    setReloading(true);
    try {
      const fresh = await reload();
      editor.replaceLayout(fresh.layout);
      autosaver.reset(fresh.layout, fresh.revision);
    } finally {
      setReloading(false);
    }
  };

  // Wider than the page column: a long mug strip needs the whole window. The frame's rounded
  // corners are on the cells that touch them, not an overflow clip of the whole frame: a rounded
  // clip over the canvas makes Chromium composite it through a masked pass of its own, which in
  // software compositing took about 20 ms of CPU per frame of a drag (2.5 ms without it).
  return (
    <div className="relative left-1/2 grid h-[calc(100vh-10.5rem)] min-h-[520px] w-[calc(100vw-2rem)] -translate-x-1/2 grid-cols-[14rem_minmax(0,1fr)_17rem] grid-rows-[auto_auto_minmax(0,1fr)] rounded-lg border border-sand bg-paper">
      <div className="col-span-3 flex flex-wrap items-center justify-between gap-2 rounded-t-lg border-b border-sand bg-paper px-3 py-2">
        <EditorToolbar editor={editor} screen={screen} />
        <SoftProofToggle view={softProof} />
        <SaveStatusBar autosaver={autosaver} onReload={onReload} reloading={reloading} />
      </div>
      {/* always present, so the grid's rows stay toolbar / notice / body even with no notice */}
      <div className="col-span-3"><NewerVersions editor={editor} uses={product.motifs} /></div>
      <MotifTray onPlace={(m) => place(m)} onPlaceOriginal={placeOriginal} usualOriginalId={usualOriginalOf(product.motifs)} />
      <div ref={canvasBox} className="relative min-h-0">
        <EditorCanvas editor={editor} onDropMotif={place} loadThumb={loadThumb} />
        {softProof.on && <SoftProofNotice view={softProof} unsaved={saveStatus.kind !== 'saved' || savedRevision !== saveStatus.revision} />}
      </div>
      <div className="flex min-h-0 flex-col">
        <Inspector editor={editor} />
        <WrapPreview editor={editor} template={product.template} loadThumb={loadThumb} />
        <PreflightPanel editor={editor} productId={product.id} savedRevision={savedRevision} />
      </div>
      <HelpSheet editor={editor} />
    </div>
  );
}
