import { displaySourcePath } from '../../../../shared/library/source-path';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { ImportReportDto } from '@shared/contracts/originals';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function ReportSection({ title, explain, children }: { title: string; explain: string; children?: ReactNode }) {
  return (
    <section className="flex flex-col gap-1.5 border-t border-sand pt-3 first:border-0 first:pt-0">
      <h3 className="font-semibold text-ink">{title}</h3>
      <p className="text-sm text-ink-soft">{explain}</p>
      {children}
    </section>
  );
}

function PathList({ items }: { items: { key: string; path: string; detail: ReactNode }[] }) {
  return (
    <ul className="flex flex-col gap-1">
      {items.map((item) => (
        <li key={item.key} className="flex flex-wrap gap-x-2 break-words">
          <span className="font-semibold text-ink">{displaySourcePath(item.path)}</span>
          <span className="text-ink-soft">{item.detail}</span>
        </li>
      ))}
    </ul>
  );
}

function TextList({ lines }: { lines: string[] }) {
  return (
    <ul className="list-disc pl-5 text-ink">
      {lines.map((line, i) => (
        <li key={i}>{line}</li>
      ))}
    </ul>
  );
}

const motifLink = (id: string, text: ReactNode) => (
  <Link to={`/library/${id}`} className="text-tide-deep underline">
    {text}
  </Link>
);

// What the import did with each layer, in plain words; every layer it did not turn into a
// motif of its own is named with the reason. A flat image or drawing (`layered` false) is one
// picture, and the words say so.
export function ImportReport({ report, layered = true }: { report: ImportReportDto; layered?: boolean }) {
  const sections: ReactNode[] = [];
  sections.push(
    <ReportSection
      key="created"
      title={report.created === 0 ? 'No new motifs' : `${plural(report.created, 'new motif', 'new motifs')} created`}
      explain={report.created === 0
        ? (layered ? 'Everything in this file was already in the library.' : 'This picture was already in the library.')
        : (layered ? 'Layers and groups that were not in the library before.' : 'The picture was not in the library before.')}
    />,
  );
  if (report.linkedExisting.length > 0) {
    sections.push(
      <ReportSection
        key="linked"
        title={layered ? `${plural(report.linkedExisting.length, 'layer matches', 'layers match')} a motif already in the library` : 'The picture matches a motif already in the library'}
        explain="Exactly the same pixels were already in the studio, so the original now points at that motif instead of making a copy."
      >
        <PathList items={report.linkedExisting.map((l) => ({ key: l.sourcePath, path: l.sourcePath, detail: <>same as {motifLink(l.motifId, l.motifName)}</> }))} />
      </ReportSection>,
    );
  }
  if (report.newVersions.length > 0) {
    sections.push(
      <ReportSection
        key="versions"
        title={`${plural(report.newVersions.length, 'motif has', 'motifs have')} a new version`}
        explain={`${layered ? 'These layers' : 'The picture'} changed since the earlier original. Older versions stay readable, and products keep the version they use until someone updates them.`}
      >
        <PathList items={report.newVersions.map((v) => ({ key: v.sourcePath, path: v.sourcePath, detail: motifLink(v.motifId, `now version ${v.version}`) }))} />
      </ReportSection>,
    );
  }
  if (report.unchanged.length > 0) {
    sections.push(
      <ReportSection
        key="unchanged"
        title={`${plural(report.unchanged.length, 'motif is', 'motifs are')} unchanged`}
        explain={layered ? 'Same layer, same pixels as in the earlier original; nothing new was stored.' : 'The same pixels as in the earlier original; nothing new was stored.'}
      />,
    );
  }
  if (report.removed.length > 0) {
    sections.push(
      <ReportSection
        key="removed"
        title={`${plural(report.removed.length, 'layer is', 'layers are')} no longer in this file`}
        explain="They were in the earlier original. Their motifs stay in the library and in products."
      >
        <PathList items={report.removed.map((r) => ({ key: r.sourcePath, path: r.sourcePath, detail: motifLink(r.motifId, r.motifName) }))} />
      </ReportSection>,
    );
  }
  if (report.skipped.length > 0) {
    sections.push(
      <ReportSection key="skipped" title={`${plural(report.skipped.length, 'layer was', 'layers were')} skipped`} explain="These did not become motifs.">
        <PathList items={report.skipped.map((s, i) => ({ key: `${s.sourcePath}-${i}`, path: s.sourcePath, detail: `— ${s.reason}` }))} />
      </ReportSection>,
    );
  }
  if (report.unsupported.length > 0) {
    sections.push(
      <ReportSection
        key="unsupported"
        title="Not drawn in the motifs"
        explain="These parts of the file cannot be drawn yet. The motifs were made without them, so they may look different from the original."
      >
        <PathList items={report.unsupported.map((u, i) => ({ key: `${u.sourcePath}-${u.feature}-${i}`, path: u.sourcePath, detail: `— ${u.feature}` }))} />
      </ReportSection>,
    );
  }
  if (report.leftOut.length > 0) {
    sections.push(
      <ReportSection
        key="left-out"
        title="Left out for safety"
        explain="Parts of the drawing that could run code or fetch files from elsewhere were removed before it was drawn. The stored file is unchanged."
      >
        <TextList lines={report.leftOut} />
      </ReportSection>,
    );
  }
  if (report.skipped.length === 0 && report.unsupported.length === 0 && report.leftOut.length === 0) {
    sections.push(
      <ReportSection
        key="complete"
        title="Nothing left out"
        explain={layered ? 'Every layer with pixels became part of a motif, and everything in the file could be drawn.' : 'Everything in the file could be drawn.'}
      />,
    );
  }
  if (report.notes.length > 0) {
    sections.push(
      <ReportSection key="notes" title="Notes" explain="Other things worth knowing about this import.">
        <TextList lines={report.notes} />
      </ReportSection>,
    );
  }
  return <div className="flex flex-col gap-3">{sections}</div>;
}
