import { describe, expect, it } from 'vitest';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import { manifestVariants, previewBlanks, variantBlank, variantFolders, variantsCsv } from './variant-print-files';

const v = (id: string, name: string, sku: string | null, options: object = {}) => ({ id, name, sku, options });

describe('print files and previews per product variant', () => {
  it('prints a variant on its template blank with its own body and handle colours on top', () => {
    const blackHandle = mug11oz.variants.find((x) => x.id === 'black-handle')!;
    expect(variantBlank(mug11oz, v('a', 'Black', null, { templateVariantId: 'black-handle' }))).toEqual({ ...mug11oz.blank, ...blackHandle.blank });
    expect(variantBlank(mug11oz, v('b', 'Red', null, { templateVariantId: 'black-handle', handleColour: '#c0392b' })).handle).toBe('#c0392b');
    expect(variantBlank(mug11oz, v('c', 'Navy', null, { blankColour: '#1f3a5f' }))).toEqual({ ...mug11oz.blank, body: '#1f3a5f' });
  });

  it('names preview folders by SKU, else by name, never twice', () => {
    expect(variantFolders([v('1', 'Red handle', 'SM-RED'), v('2', 'Red handle', null), v('3', 'Red  handle!', null), v('4', '***', null)])).toEqual(['SM-RED', 'Red-handle', 'Red-handle-2', 'variant-4']);
  });

  it('previews the template blanks when the product has no variants', () => {
    expect(previewBlanks(mug11oz, []).map((b) => b.folder)).toEqual(mug11oz.variants.map((x) => x.id));
    expect(previewBlanks(mug11oz, [v('1', 'Red', 'SM-RED', { handleColour: '#c0392b' })])).toEqual([{ folder: 'SM-RED', templateVariantId: null, blank: { ...mug11oz.blank, handle: '#c0392b' } }]);
  });

  it('points every variant at the one print file and writes them as an RFC 4180 table', () => {
    const rows = manifestVariants(mug11oz, [v('1', 'Red, glossy', 'SM-RED', { handleColour: '#c0392b' }), v('2', 'Say "hi"', null)], 'print-file.png');
    expect(rows.map((r) => [r.printFile, r.previews])).toEqual([['print-file.png', 'previews/SM-RED/'], ['print-file.png', 'previews/Say-hi/']]);
    // RFC 4180 §2: CRLF line breaks; fields with commas or quotes are quoted, inner quotes doubled
    expect(variantsCsv(rows)).toBe(
      'sku,variant,print_file,blank_body,blank_handle,previews\r\n' +
      `SM-RED,"Red, glossy",print-file.png,${mug11oz.blank.body},#c0392b,previews/SM-RED/\r\n` +
      `,"Say ""hi""",print-file.png,${mug11oz.blank.body},${mug11oz.blank.handle ?? ''},previews/Say-hi/\r\n`,
    );
  });
});
