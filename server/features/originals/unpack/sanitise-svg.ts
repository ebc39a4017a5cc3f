import type { JSDOM } from 'jsdom';

// An uploaded SVG is someone's drawing, and also a document that can carry scripts, event
// handlers, embedded HTML and links that make the renderer fetch files or addresses. Before it
// is drawn it goes through DOMPurify (its SVG and SVG-filter profiles: no script, no
// foreignObject, no on… attributes), and then through our own rule that a drawing may only point
// inside itself (href="#id", url(#id)) or at an image embedded as a data: URL, so drawing it never
// reaches outside the file. What was left out is counted, for the import report.

export type SanitisedSvg = {
  /** The drawing as standalone SVG markup (XML, with its namespaces declared). */
  svg: string;
  /** What was left out, in the user's words, e.g. "2 script elements". */
  removed: string[];
};

export class SvgRefused extends Error {
  constructor(readonly code: 'svg.unsafe' | 'svg.unreadable', message: string) {
    super(message);
  }
}

// Inside the drawing, or an embedded raster image; anything else would be fetched.
const SAFE_REFERENCE = /^\s*(#|data:image\/(png|jpeg|webp);base64,)/i;
// url(...) in CSS that does not point inside the drawing
const OUTSIDE_URL = /url\(\s*(?!['"]?\s*#)/i;
const CSS_IMPORT = /@import/i;

type Purifier = ReturnType<typeof import('dompurify').default>;
let loaded: { purifier: Purifier; window: JSDOM['window'] } | null = null;

// jsdom and DOMPurify are loaded on the first SVG only: the unpack child starts for every
// upload, and most are PSDs.
async function purify() {
  if (!loaded) {
    const [{ JSDOM }, { default: createDOMPurify }] = await Promise.all([import('jsdom'), import('dompurify')]);
    const window = new JSDOM('').window;
    loaded = { purifier: createDOMPurify(window as unknown as Parameters<typeof createDOMPurify>[0]), window };
  }
  return loaded;
}

/** The drawing without anything that could run or reach outside it; refuses files that are not one SVG drawing. */
export async function sanitiseSvg(text: string): Promise<SanitisedSvg> {
  // A DOCTYPE with an internal subset can declare entities that expand without bound; drawings
  // have no use for one.
  if (/<!DOCTYPE[^>]*\[/i.test(text) || /<!ENTITY/i.test(text)) {
    throw new SvgRefused('svg.unsafe', 'The SVG declares its own entities in a DOCTYPE, which drawings do not need; save it again without a DOCTYPE');
  }
  const { purifier: p, window: w } = await purify();
  const links = { outside: 0, styles: 0 };
  p.removeAllHooks();
  p.addHook('uponSanitizeAttribute', (_node, data) => {
    const name = data.attrName.toLowerCase();
    if ((name === 'href' || name === 'xlink:href' || name === 'src') && !SAFE_REFERENCE.test(data.attrValue)) {
      data.keepAttr = false;
      links.outside++;
    } else if (OUTSIDE_URL.test(data.attrValue) || CSS_IMPORT.test(data.attrValue)) {
      data.keepAttr = false;
      links.outside++;
    }
  });
  p.addHook('uponSanitizeElement', (node, data) => {
    if (data.tagName === 'style' && (OUTSIDE_URL.test(node.textContent ?? '') || CSS_IMPORT.test(node.textContent ?? ''))) {
      node.textContent = '';
      links.styles++;
    }
  });
  let fragment: DocumentFragment;
  try {
    // <use> is left out by default because it can pull in other files; the hook above keeps it to
    // references inside the drawing, where symbols and repeated shapes need it
    fragment = p.sanitize(text, { USE_PROFILES: { svg: true, svgFilters: true }, ADD_TAGS: ['use'], RETURN_DOM_FRAGMENT: true });
  } finally {
    p.removeAllHooks();
  }
  const root = fragment.firstElementChild;
  if (!root || root.localName !== 'svg' || fragment.children.length !== 1) {
    throw new SvgRefused('svg.unreadable', 'The file does not hold one SVG drawing that can be read');
  }
  const removed = summarise(p.removed, links);
  return { svg: new w.XMLSerializer().serializeToString(root), removed };
}

type Removed = { element?: Element | null; attribute?: Attr | null; from?: Element | null };

function summarise(items: readonly unknown[], links: { outside: number; styles: number }): string[] {
  const elements = new Map<string, number>();
  const attributes = new Map<string, number>();
  for (const item of items as Removed[]) {
    if (item.attribute) {
      const name = item.attribute.name.toLowerCase();
      if (name === 'href' || name === 'xlink:href' || name === 'src' || name === 'style') continue; // counted as links below
      attributes.set(name, (attributes.get(name) ?? 0) + 1);
    } else if (item.element) {
      const name = item.element.nodeName;
      // the parser's own wrappers, whitespace and comments, not part of the drawing
      if (['#text', '#comment', 'html', 'head', 'body', 'HTML', 'HEAD', 'BODY'].includes(name)) continue;
      elements.set(name, (elements.get(name) ?? 0) + 1);
    }
  }
  const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
  const lines = [...elements].map(([name, n]) => plural(n, `${name} element`, `${name} elements`));
  const handlers = [...attributes].filter(([name]) => name.startsWith('on'));
  const others = [...attributes].filter(([name]) => !name.startsWith('on'));
  if (handlers.length) lines.push(`${plural(handlers.reduce((s, [, n]) => s + n, 0), 'event handler', 'event handlers')} (${handlers.map(([n]) => n).join(', ')})`);
  if (others.length) lines.push(`${plural(others.reduce((s, [, n]) => s + n, 0), 'attribute', 'attributes')} (${others.map(([n]) => n).join(', ')})`);
  if (links.outside) lines.push(plural(links.outside, 'link outside the drawing', 'links outside the drawing'));
  if (links.styles) lines.push(plural(links.styles, 'style sheet that loads from outside', 'style sheets that load from outside'));
  return lines;
}
