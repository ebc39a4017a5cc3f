import { useState } from 'react';
import type { ProductDetail } from '@shared/contracts/products';
import { Button } from '../../../components/ui/button';
import { getMotifVersions } from '../api/get-motif-versions';
import type { ProductEditor } from '../editor';
import { switchMotifVersion } from '../motif-versions';
import { thumbUrl } from '../render/image-cache';
import { useEditorSelector } from './use-editor-state';

type Use = ProductDetail['motifs'][number];

/** Motifs this product uses at an older version than the library's: shows both and offers the newer one. */
export function NewerVersions({ editor, uses }: { editor: ProductEditor; uses: readonly Use[] }) {
  // motif@version pairs only, so moving placements does not re-render this notice
  const pairs = useEditorSelector(editor, (s) => s.scene.layout.placements.map((p) => (p.type === 'text' ? '' : `${p.motifId}@${p.version}`)).join(' '));
  const [problem, setProblem] = useState<string | null>(null);
  const inLayout = (u: Use) => pairs.split(' ').some((pair) => { const [id, v] = pair.split('@'); return id === u.motifId && Number(v) < u.currentVersion; });
  const stale = uses.filter((u) => u.usedVersion < u.currentVersion && inLayout(u));
  if (stale.length === 0) return null;

  const update = async (u: Use) => {
    setProblem(null);
    try {
      const { versions } = await getMotifVersions({ id: u.motifId });
      const current = versions.find((v) => v.version === u.currentVersion);
      if (!current) throw new Error('That version is no longer in the library');
      editor.change((l) => switchMotifVersion(l, u.motifId, current.version, current));
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The newer version could not be loaded');
    }
  };

  return (
    <section aria-label="Newer motif versions" className="border-b border-sand bg-[#fdf6e3] px-3 py-2 text-sm">
      {stale.map((u) => (
        <div key={u.motifId} className="flex items-center gap-3">
          <img src={thumbUrl(u.motifId, u.usedVersion)} alt={`${u.name}, version ${u.usedVersion} (in this product)`} className="h-10 w-10 object-contain" />
          <span aria-hidden="true">→</span>
          <img src={thumbUrl(u.motifId, u.currentVersion)} alt={`${u.name}, version ${u.currentVersion} (in the library)`} className="h-10 w-10 object-contain" />
          <span>“{u.name}” has a newer version ({u.usedVersion} → {u.currentVersion}).</span>
          <Button size="sm" variant="secondary" onClick={() => void update(u)}>Use version {u.currentVersion}</Button>
        </div>
      ))}
      {problem && <p className="text-rust">{problem}</p>}
    </section>
  );
}
