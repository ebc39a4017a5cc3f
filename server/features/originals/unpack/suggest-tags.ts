// Words that name a layer's role in the file, not its artwork: an editor's default names
// ("Layer 3 copy", "Group 2") and our own fallbacks; and English joining words ("Fox with Lantern").
const NOISE_WORDS = new Set([
  'layer', 'layers', 'copy', 'group', 'unnamed', 'untitled',
  'the', 'and', 'with', 'of', 'on', 'in', 'for', 'to', 'at', 'by', 'an',
]);

// Tag suggestions from a motif's own name first, then its groups' names, innermost first.
export function suggestTags(names: readonly string[]): string[] {
  const tags: string[] = [];
  for (const name of names) {
    for (const word of splitWords(name)) {
      if (!tags.includes(word)) tags.push(word);
    }
  }
  return tags;
}

export function splitWords(name: string): string[] {
  const spaced = name
    // camelCase and PascalCase: "puffinLeft" -> "puffin Left", "HTMLTitle" -> "HTML Title"
    .replace(/(\p{Ll})(\p{Lu})/gu, '$1 $2')
    .replace(/(\p{Lu})(\p{Lu}\p{Ll})/gu, '$1 $2')
    // letters next to digits: "puffin2" -> "puffin 2"
    .replace(/(\p{L})(\p{N})/gu, '$1 $2')
    .replace(/(\p{N})(\p{L})/gu, '$1 $2');
  return spaced
    .split(/[^\p{L}\p{N}\p{M}]+/u)
    .map((word) => word.toLowerCase())
    .filter((word) => Array.from(word).length > 1 && !/^\p{N}+$/u.test(word) && !NOISE_WORDS.has(word));
}
