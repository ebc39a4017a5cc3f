import { shippedFonts } from '../../../../shared/text/shipped-fonts';

// What an SVG drawing's live text asks for, and the report's note on how it was drawn.

const GENERIC_FAMILIES = new Set(['serif', 'sans-serif', 'monospace', 'cursive', 'fantasy', 'system-ui', 'emoji', 'math', 'fangsong', 'ui-serif', 'ui-sans-serif', 'ui-monospace', 'ui-rounded', 'inherit', 'initial', 'unset']);

// The typefaces the drawing's text asks for by name (font-family attributes and CSS), generic
// families left out; at most 50, each cut short and stripped of control characters.
export function fontFamiliesNamed(svg: string): string[] {
  const found = new Map<string, string>();
  const decode = (text: string) => text.replace(/&quot;|&#34;/g, '"').replace(/&apos;|&#39;/g, "'");
  const lists = [...svg.matchAll(/font-family\s*=\s*(?:"([^"]*)"|'([^']*)')/gi)].map((m) => decode(m[1] ?? m[2] ?? ''));
  // CSS, in style attributes and style elements
  const sheets = [...svg.matchAll(/\sstyle\s*=\s*(?:"([^"]*)"|'([^']*)')|<style[^>]*>([\s\S]*?)<\/style>/gi)].map((m) => decode(m[1] ?? m[2] ?? m[3] ?? ''));
  for (const sheet of sheets) for (const m of sheet.matchAll(/font-family\s*:\s*([^;}]+)/gi)) lists.push(m[1]);
  for (const list of lists) {
    for (const part of list.split(',')) {
      const name = part.replace(/!important/i, '').trim().replace(/^["']|["']$/g, '').replace(/[\u0000-\u001f\u007f]/g, '').trim().slice(0, 60);
      if (!name || GENERIC_FAMILIES.has(name.toLowerCase())) continue;
      if (!found.has(name.toLowerCase())) found.set(name.toLowerCase(), name);
    }
  }
  return [...found.values()].slice(0, 50);
}

// librsvg draws live text with the app's own typefaces (svg-font-config.ts) or this server's.
export function liveTextNote(families: string[], fontsReady: boolean): string {
  const exact = 'To keep the lettering exact, turn text into outlines before exporting.';
  if (!fontsReady) return `The drawing has live text, drawn with the fonts this server has, which may differ from yours. ${exact}`;
  const shipped = new Set(shippedFonts.map((f) => f.name.toLowerCase()));
  const missing = families.filter((name) => !shipped.has(name.toLowerCase()));
  const present = families.filter((name) => shipped.has(name.toLowerCase()));
  const list = (names: string[]) => names.map((n) => `"${n}"`).join(', ');
  if (missing.length > 0) {
    const more = missing.length > 3 ? ` and ${missing.length - 3} more` : '';
    return `The drawing's live text asks for ${list(missing.slice(0, 3))}${more}, which this app does not have, so that text is drawn in ${shippedFonts[0].name} (or the closest font on this server). ${exact}`;
  }
  if (present.length > 0) return `The drawing's live text is drawn in this app's own ${list(present)}; a weight the app does not ship takes the nearest one. ${exact}`;
  return `The drawing's live text names no typeface and is drawn in ${shippedFonts[0].name}. ${exact}`;
}
