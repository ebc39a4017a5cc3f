// Decides, for each motif cut from a new upload, whether it is new, a new version of a motif
// from the original it replaces, unchanged, or pixels the studio already has.
export type IncomingMotif = { sourcePath: string; contentHash: string };
export type KnownMotif = { motifId: string; name: string; sourcePath: string; contentHash: string; version: number };

export type MatchDecision =
  | { kind: 'new' }
  | { kind: 'unchanged'; motifId: string; version: number }
  | { kind: 'new-version'; motifId: string; version: number }
  | { kind: 'linked-existing'; motifId: string; version: number; name: string };

export function matchIncomingMotifs(
  incoming: IncomingMotif[],
  previous: KnownMotif[],
  studioByHash: Map<string, KnownMotif>,
): { decisions: MatchDecision[]; removed: KnownMotif[] } {
  const bySource = new Map(previous.map((m) => [m.sourcePath, m]));
  const byHash = new Map(previous.map((m) => [m.contentHash, m]));
  const used = new Set<string>();
  const decisions: MatchDecision[] = incoming.map(() => ({ kind: 'new' }));

  // Source path first: a layer that kept its place in the file is the same motif.
  incoming.forEach((m, i) => {
    const prev = bySource.get(m.sourcePath);
    if (!prev || used.has(prev.motifId)) return;
    used.add(prev.motifId);
    decisions[i] = prev.contentHash === m.contentHash
      ? { kind: 'unchanged', motifId: prev.motifId, version: prev.version }
      : { kind: 'new-version', motifId: prev.motifId, version: prev.version + 1 };
  });
  // Then pixels: a renamed or moved layer with the same pixels is the same motif.
  incoming.forEach((m, i) => {
    if (decisions[i].kind !== 'new') return;
    const prev = byHash.get(m.contentHash);
    if (prev && !used.has(prev.motifId)) {
      used.add(prev.motifId);
      decisions[i] = { kind: 'unchanged', motifId: prev.motifId, version: prev.version };
      return;
    }
    const known = studioByHash.get(m.contentHash);
    if (known) decisions[i] = { kind: 'linked-existing', motifId: known.motifId, version: known.version, name: known.name };
  });
  const removed = previous.filter((p) => !used.has(p.motifId));
  return { decisions, removed };
}
