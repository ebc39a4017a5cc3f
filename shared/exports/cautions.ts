import type { Template } from '../templates';

/**
 * The usual cautions where a product touches food or heat. General reminders only: the
 * printer's instructions for the blank and the local rules on food-contact articles decide.
 */
export function cautionsFor(template: Template): string[] {
  const lines = [
    'These notes are general reminders, not a safety assessment. The printer\'s instructions for this blank and the rules where you sell it come first.',
  ];
  if (template.kind === 'mug-wrap') {
    const name = template.name.toLowerCase();
    lines.push(
      'Hot drinks: a mug holds hot liquid. Describe it to buyers as the printer describes the blank, and keep the printed area clear of the lip if the printer asks you to.',
      'Dishwasher: printed finishes differ. Only call the mug dishwasher-safe if the printer states it for this blank and process; otherwise advise hand washing.',
      'Microwave: do not call the mug microwave-safe unless the printer states it. Metallic inks, metal rims and enamelled metal mugs must never go in a microwave.',
    );
    if (name.includes('enamel')) lines.push('Enamel mugs are metal: not for the microwave, and the rim and handle get hot with hot drinks. Chipped enamel should not be used for food.');
    // a variant whose coating hides the print is a heat-changing blank's cold state; older custom
    // templates copied from the built-in one may lack the flag but keep its ids
    if (template.variants.some((v) => v.hidesPrint === true || v.id.startsWith('heat-changing'))) {
      lines.push('Heat-changing mugs: the coating is usually hand-wash only and not for the microwave; follow the printer\'s care notes and pass them on to buyers.');
    }
    lines.push('Food contact: whether a decorated mug may be sold for food and drink is set by local rules on food-contact materials; ask the printer for the declaration that covers the blank and inks.');
  } else {
    lines.push('This product is not meant for food or drink; no food-contact or heat claims apply.');
  }
  return lines;
}

export function cautionsText(template: Template): string {
  return `Cautions for ${template.name}\n\n${cautionsFor(template).map((l) => `- ${l}`).join('\n')}\n`;
}
