// Words as search sees them: letters and digits, lower case, accents folded ("Café" finds "cafe").
export function searchWords(text: string): string[] {
  return text
    .normalize('NFKD')
    .replace(/\p{M}+/gu, '')
    .toLowerCase()
    .split(/[^\p{L}\p{N}]+/u)
    .filter((w) => w.length > 0);
}
