import { useState } from 'react';
import type { Finding, Severity } from '@shared/preflight';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Spinner } from '../../../components/ui/spinner';
import { useProductPreflight } from '../api/get-product-preflight';
import type { ProductEditor } from '../editor';
import { useLivePreflight } from '../preflight/use-live-preflight';
import { useEditorSelector } from './use-editor-state';

const severityBadge: Record<Severity, { tone: BadgeTone; label: string }> = {
  problem: { tone: 'rust', label: 'Problem' },
  warning: { tone: 'ochre', label: 'Warning' },
  ok: { tone: 'kelp', label: 'Fine' },
};

type PreflightPanelProps = { editor: ProductEditor; productId: string; savedRevision: number };

/** The print check beside the canvas: the shared rules, live, with the server's colour facts of the last save. */
export function PreflightPanel({ editor, productId, savedRevision }: PreflightPanelProps) {
  const server = useProductPreflight(productId, savedRevision);
  const live = useLivePreflight(editor, server.data);
  const selection = useEditorSelector(editor, (s) => s.selection);
  const [open, setOpen] = useState(true);
  const [showPassed, setShowPassed] = useState(false);
  const needsAction = live.findings.filter((f) => f.severity !== 'ok');
  const passed = live.findings.filter((f) => f.severity === 'ok');
  const { problems, warnings } = live.summary;

  return (
    <section aria-labelledby="preflight-heading" className="flex max-h-[50%] min-h-0 flex-col rounded-br-lg border-t border-l border-sand bg-paper text-sm" data-testid="preflight-panel">
      <div className="flex flex-wrap items-center gap-x-2 gap-y-1 px-3 py-2">
        <h2 id="preflight-heading" className="mr-auto text-base font-semibold whitespace-nowrap text-ink">Print check</h2>
        <div className="flex flex-wrap items-center gap-1.5">
          {problems > 0 && <Badge tone="rust">{problems} {problems === 1 ? 'problem' : 'problems'}</Badge>}
          {warnings > 0 && <Badge tone="ochre">{warnings} {warnings === 1 ? 'warning' : 'warnings'}</Badge>}
          {problems + warnings === 0 && <Badge tone="kelp">Ready to print</Badge>}
          <Button size="sm" variant="quiet" aria-expanded={open} aria-controls="preflight-findings" onClick={() => setOpen(!open)}>{open ? 'Hide' : 'Show'}</Button>
        </div>
      </div>
      {open && (
        <div id="preflight-findings" className="min-h-0 overflow-y-auto px-3 pb-3">
          <ServerStatus loading={server.isFetching} error={server.error} onRetry={() => void server.refetch()} pending={live.pendingPlacements.length} />
          {needsAction.length > 0 && (
            <ul aria-label="Findings to look at" className="space-y-1.5">
              {needsAction.map((f) => <FindingRow key={f.id} finding={f} selected={f.placementId !== undefined && selection.includes(f.placementId)} onSelect={(id) => editor.select([id])} />)}
            </ul>
          )}
          {passed.length > 0 && (
            <div className="mt-2">
              <Button size="sm" variant="quiet" className="px-1" aria-expanded={showPassed} onClick={() => setShowPassed(!showPassed)}>
                {showPassed ? 'Hide the passed checks' : `${passed.length} ${passed.length === 1 ? 'check' : 'checks'} passed`}
              </Button>
              {showPassed && <ul aria-label="Passed checks" className="space-y-1.5">{passed.map((f) => <FindingRow key={f.id} finding={f} selected={false} onSelect={() => {}} />)}</ul>}
            </div>
          )}
          {server.data && server.data.palette.length > 0 && <Palette groups={server.data.palette} />}
        </div>
      )}
    </section>
  );
}

function FindingRow({ finding, selected, onSelect }: { finding: Finding; selected: boolean; onSelect: (placementId: string) => void }) {
  const badge = severityBadge[finding.severity];
  const body = (
    <>
      <Badge tone={badge.tone} className="mb-1">{badge.label}</Badge>
      <span className="block text-ink">{finding.message}</span>
      {finding.severity !== 'ok' && <span className="block text-xs text-ink-soft">{`What to do: ${finding.fix}`}</span>}
    </>
  );
  const box = 'block w-full rounded-md border px-2 py-1.5 text-left';
  if (finding.placementId === undefined) return <li className={`${box} border-sand`}>{body}</li>;
  const id = finding.placementId;
  return (
    <li>
      <button type="button" className={`${box} ${selected ? 'border-tide bg-tide/10' : 'border-sand hover:border-tide'} focus-visible:outline-2 focus-visible:outline-tide`}
        aria-pressed={selected} aria-label={`${badge.label}: ${finding.message}. Select it on the product.`} onClick={() => onSelect(id)}>
        {body}
      </button>
    </li>
  );
}

function ServerStatus({ loading, error, onRetry, pending }: { loading: boolean; error: Error | null; onRetry: () => void; pending: number }) {
  if (error) {
    return (
      <div role="alert" className="mb-2 rounded-md border border-rust/50 bg-rust/10 px-2 py-1.5 text-xs text-rust">
        {`The colour and rights check on the server failed: ${error.message}`}
        <Button size="sm" variant="quiet" className="ml-1 px-1" onClick={onRetry}>Try again</Button>
      </div>
    );
  }
  return (
    <p role="status" className="mb-2 flex items-center gap-1.5 text-xs text-ink-soft">
      {loading && <Spinner className="size-3.5 text-tide" />}
      {loading ? 'Measuring colours and rights of the saved design…' : pending > 0 ? 'New motifs: rights and transparency are checked after the next save.' : 'Colours, palette and rights as of the last save; the rest updates as you work.'}
    </p>
  );
}

function Palette({ groups }: { groups: readonly { hex: string; share: number }[] }) {
  return (
    <div className="mt-3">
      <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">Colour groups</h3>
      <ul aria-label="Colour groups of the design" className="flex flex-wrap gap-1">
        {groups.map((g) => (
          <li key={g.hex} title={`${g.hex} · ${Math.round(g.share * 100)} %`} className="size-6 rounded border border-sand" style={{ backgroundColor: g.hex }}>
            <span className="sr-only">{`${g.hex}, ${Math.round(g.share * 100)} % of the design`}</span>
          </li>
        ))}
      </ul>
    </div>
  );
}
