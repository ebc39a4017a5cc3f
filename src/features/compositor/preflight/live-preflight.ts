import type { ProductPreflightView } from '@shared/contracts/exports';
import { runPreflight, type MotifFacts, type PreflightReport } from '@shared/preflight';
import { createScene, type Layout } from '@shared/scene';
import type { Template } from '@shared/templates';

export type LivePreflight = PreflightReport & {
  /** Placements whose library facts (rights, transparency) the server has not measured yet. */
  pendingPlacements: string[];
};

const keyOf = (motifId: string, version: number) => `${motifId}@${version}`;

/**
 * The shared rules run on the editor's layout as it is now, with the facts only the server can
 * measure (motif rights and transparency, palette, soft proof) taken from its last answer. A motif
 * placed since that answer gets its size from the placement and counts as pending, not missing:
 * only the server can say a motif is gone from the library.
 */
export function livePreflight(layout: Layout, template: Template, server: ProductPreflightView | undefined): LivePreflight {
  const known = new Map((server?.motifs ?? []).map((m) => [keyOf(m.id, m.version), m]));
  const missing = new Set(
    (server?.report.findings ?? []).flatMap((f) => {
      if (f.rule !== 'missing-motif' || !f.placementId) return [];
      const p = layout.placements.find((q) => q.id === f.placementId);
      return p && p.type !== 'text' ? [keyOf(p.motifId, p.version)] : [];
    }),
  );
  const provisional = new Map<string, MotifFacts>();
  const pendingPlacements: string[] = [];
  for (const p of layout.placements) {
    if (p.type === 'text') continue;
    const key = keyOf(p.motifId, p.version);
    if (known.has(key) || missing.has(key)) continue;
    pendingPlacements.push(p.id);
    // own_work / opaque until measured, so a pending motif never raises a warning it may not deserve
    if (!provisional.has(key)) provisional.set(key, { id: p.motifId, version: p.version, width: p.naturalWidth, height: p.naturalHeight, rightsStatus: 'own_work', hasTransparency: false });
  }
  const report = runPreflight({
    scene: createScene(layout),
    template,
    motifs: [...known.values(), ...provisional.values()],
    paletteGroups: server?.palette,
    softProof: server ? { shareOverDeltaE5: server.softProof.shareOverDeltaE5, profileName: server.softProof.profileName } : null,
    // the studio's own limit and the product's own blanks, as the server checked them
    options: server ? { paletteLimit: server.paletteLimit } : undefined,
    productBlanks: server?.productBlanks,
  });
  return { ...report, pendingPlacements };
}
