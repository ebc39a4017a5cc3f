import { useId } from 'react';
import { templateGeometry } from '@shared/templates/template-geometry';
import type { Template } from '@shared/templates/template-schema';

const round = (n: number, places = 3) => Number(n.toFixed(places)).toString();
const lengthLabel = (value: number, unit: Template['unit']) => `${round(value)} ${unit}`;

/**
 * The template drawn to scale with its figures written on it: trim, bleed, safe area, print
 * area, keep-out zones and, for wraps, the handle, seam and front centre. Redraws as the form
 * changes, so a mistyped figure shows at once.
 */
export function TemplateDiagram({ template, guideImageUrl }: { template: Template; guideImageUrl?: string | null }) {
  const hatchId = useId();
  const g = templateGeometry(template);
  const { width: w, height: h } = g.size;
  const unit = template.unit;
  const text = Math.max(w, h) / 34;
  const pad = text * 3.4;
  const view = `${-pad} ${-pad} ${w + pad * 2} ${h + pad * 2.6}`;
  const line = { vectorEffect: 'non-scaling-stroke' as const };
  const trimRight = g.trim.x + g.trim.width;
  const trimBottom = g.trim.y + g.trim.height;
  const markers = g.wrap
    ? [
        { x: g.wrap.handleX, label: 'Handle', colour: 'var(--color-rust)' },
        { x: g.wrap.seamX, label: 'Seam', colour: 'var(--color-ink-soft)' },
        { x: g.wrap.frontCentreX, label: 'Front centre', colour: 'var(--color-tide)' },
      ].filter((m) => m.x >= 0 && m.x <= w)
    : [];

  return (
    <figure className="flex flex-col gap-2">
      <svg viewBox={view} role="img" aria-labelledby={`${hatchId}-title`} className="max-h-[28rem] w-full rounded-md border border-sand bg-paper">
        <title id={`${hatchId}-title`}>
          {`${template.name}: trim ${lengthLabel(template.size.width, unit)} by ${lengthLabel(template.size.height, unit)}, bleed ${lengthLabel(template.bleed, unit)}, safe margin ${lengthLabel(template.safeMargin, unit)}, print file ${w} by ${h} pixels at ${template.dpi} DPI`}
        </title>
        <defs>
          <pattern id={`${hatchId}-hatch`} width={text / 1.5} height={text / 1.5} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <line x1="0" y1="0" x2="0" y2={text / 1.5} stroke="var(--color-rust)" strokeWidth={text / 8} opacity="0.55" />
          </pattern>
        </defs>
        {/* bleed: the whole file, of which only the trim survives the cut */}
        <rect x={0} y={0} width={w} height={h} fill="var(--color-ochre)" opacity="0.16" />
        {guideImageUrl && <image href={guideImageUrl} x={0} y={0} width={w} height={h} preserveAspectRatio="none" opacity="0.55" />}
        <rect x={g.trim.x} y={g.trim.y} width={g.trim.width} height={g.trim.height} fill="var(--color-paper)" fillOpacity={guideImageUrl ? 0.35 : 1} stroke="var(--color-ink)" strokeWidth={1.5} {...line} />
        {template.printArea && (
          <rect x={g.printArea.x} y={g.printArea.y} width={g.printArea.width} height={g.printArea.height} fill="none" stroke="var(--color-tide)" strokeWidth={1.5} strokeDasharray="8 4" {...line} />
        )}
        <rect x={g.safeRect.x} y={g.safeRect.y} width={g.safeRect.width} height={g.safeRect.height} fill="none" stroke="var(--color-kelp)" strokeWidth={1.5} strokeDasharray="3 3" {...line} />
        {g.keepOuts.map((k) => (
          <g key={k.id}>
            <rect x={k.rect.x} y={k.rect.y} width={k.rect.width} height={k.rect.height} fill={`url(#${hatchId}-hatch)`} stroke="var(--color-rust)" strokeWidth={1} {...line} />
            <text x={k.rect.x + k.rect.width / 2} y={Math.max(k.rect.y, 0) + text * 1.3} fontSize={text * 0.8} textAnchor="middle" fill="var(--color-rust)" fontWeight={600}>{k.label}</text>
          </g>
        ))}
        {markers.map((m) => (
          <g key={m.label}>
            <line x1={m.x} y1={0} x2={m.x} y2={h} stroke={m.colour} strokeWidth={1.5} strokeDasharray="10 5" {...line} />
            <text x={m.x} y={h - text * 0.6} fontSize={text * 0.8} textAnchor="middle" fill={m.colour} fontWeight={600} paintOrder="stroke" stroke="var(--color-paper)" strokeWidth={text / 5}>{m.label}</text>
          </g>
        ))}
        {/* trim width, above */}
        <Dimension x1={g.trim.x} y1={-pad * 0.45} x2={trimRight} y2={-pad * 0.45} label={`${lengthLabel(template.size.width, unit)} trim`} size={text} />
        {/* trim height, left */}
        <Dimension x1={-pad * 0.45} y1={g.trim.y} x2={-pad * 0.45} y2={trimBottom} label={`${lengthLabel(template.size.height, unit)} trim`} size={text} vertical />
        {/* the print file with bleed, below */}
        <Dimension x1={0} y1={h + pad * 0.5} x2={w} y2={h + pad * 0.5} label={`${w} px with ${lengthLabel(template.bleed, unit)} bleed a side`} size={text} />
        <text x={w / 2} y={h + pad * 1.5} fontSize={text * 0.85} textAnchor="middle" fill="var(--color-ink-soft)">
          {`print file ${w} × ${h} px at ${template.dpi} DPI · safe margin ${lengthLabel(template.safeMargin, unit)}`}
        </text>
      </svg>
      <figcaption className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-soft">
        <Key swatch="border-2 border-ink bg-paper">Trim (finished edge)</Key>
        <Key swatch="bg-ochre/30">Bleed</Key>
        <Key swatch="border-2 border-dashed border-kelp">Safe area</Key>
        {template.printArea && <Key swatch="border-2 border-dashed border-tide">Print area</Key>}
        {g.keepOuts.length > 0 && <Key swatch="border border-rust bg-rust/25">Keep clear</Key>}
        {guideImageUrl && <Key swatch="bg-ink/30">Printer's guide (not printed)</Key>}
      </figcaption>
    </figure>
  );
}

function Dimension({ x1, y1, x2, y2, label, size, vertical = false }: { x1: number; y1: number; x2: number; y2: number; label: string; size: number; vertical?: boolean }) {
  const tick = size * 0.45;
  const mx = (x1 + x2) / 2;
  const my = (y1 + y2) / 2;
  const stroke = { stroke: 'var(--color-ink-soft)', strokeWidth: 1, vectorEffect: 'non-scaling-stroke' as const };
  return (
    <g>
      <line x1={x1} y1={y1} x2={x2} y2={y2} {...stroke} />
      {vertical ? (
        <>
          <line x1={x1 - tick} y1={y1} x2={x1 + tick} y2={y1} {...stroke} />
          <line x1={x2 - tick} y1={y2} x2={x2 + tick} y2={y2} {...stroke} />
        </>
      ) : (
        <>
          <line x1={x1} y1={y1 - tick} x2={x1} y2={y1 + tick} {...stroke} />
          <line x1={x2} y1={y2 - tick} x2={x2} y2={y2 + tick} {...stroke} />
        </>
      )}
      <text
        x={mx}
        y={my - size * 0.35}
        fontSize={size * 0.85}
        textAnchor="middle"
        fill="var(--color-ink)"
        paintOrder="stroke"
        stroke="var(--color-paper)"
        strokeWidth={size / 5}
        transform={vertical ? `rotate(-90 ${mx} ${my})` : undefined}
      >
        {label}
      </text>
    </g>
  );
}

function Key({ swatch, children }: { swatch: string; children: string }) {
  return (
    <span className="inline-flex items-center gap-1.5">
      <span aria-hidden="true" className={`inline-block size-3.5 rounded-sm ${swatch}`} />
      {children}
    </span>
  );
}
