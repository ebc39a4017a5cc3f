import { describe, expect, it } from 'vitest';
import { card5x7Front } from './built-in-flat';
import { mug11oz } from './built-in-mugs';
import { templateGeometry, templatePixelSize } from './template-geometry';
import { checkDraft, draftFromTemplate, withKind } from './template-draft';

describe('the template form\'s draft', () => {
  it('turns a preset into a draft and back into the same template', () => {
    expect(checkDraft(draftFromTemplate(card5x7Front), card5x7Front.id)).toEqual({ ok: true, template: card5x7Front });
  });

  it('shows derived figures to four decimals without moving anything by a visible amount', () => {
    const checked = checkDraft(draftFromTemplate(mug11oz), mug11oz.id);
    if (!checked.ok) throw new Error(checked.message);
    const before = templateGeometry(mug11oz);
    const after = templateGeometry(checked.template);
    expect(after.size).toEqual(before.size);
    // 0.00005 in at most, i.e. 0.015 px at 300 DPI
    expect(Math.abs(after.wrap!.handleX - before.wrap!.handleX)).toBeLessThan(0.02);
    after.keepOuts.forEach((k, i) => expect(Math.abs(k.rect.width - before.keepOuts[i].rect.width)).toBeLessThan(0.02));
  });

  it('reads decimals written with a comma', () => {
    const draft = { ...draftFromTemplate(card5x7Front), bleed: '0,125', width: '5', height: '7' };
    const checked = checkDraft(draft);
    if (!checked.ok) throw new Error(checked.message);
    // (5 + 2 × 0.125) in × 300 DPI = 1575 px; (7 + 0.25) × 300 = 2175 px (worked by hand)
    expect(templatePixelSize(checked.template)).toEqual({ width: 1575, height: 2175 });
  });

  it('names the field that is missing or not a number', () => {
    const checked = checkDraft({ ...draftFromTemplate(card5x7Front), width: '', dpi: 'three hundred' });
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(Object.keys(checked.fields)).toEqual(expect.arrayContaining(['size.width', 'dpi']));
  });

  it('asks a mug wrap for its blank and drops it for other kinds', () => {
    const asMug = withKind(draftFromTemplate(card5x7Front), 'mug-wrap');
    expect(asMug.wrap).not.toBeNull();
    const incomplete = checkDraft(asMug);
    expect(incomplete.ok === false && Object.keys(incomplete.fields).some((f) => f.startsWith('wrap'))).toBe(true);
    expect(withKind(draftFromTemplate(mug11oz), 'print').wrap).toBeNull();
  });
});
