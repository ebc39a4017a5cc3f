import Fuse from 'fuse.js';
import { searchWords } from '../../../shared/library/search-words';

export type SearchableFields = { name: string; tags: readonly string[]; originalName: string; sourcePath: string; notes: string };

const fields = ['name', 'tags', 'originalName', 'sourcePath', 'notes'] as const;
type Field = (typeof fields)[number];
const bit = Object.fromEntries(fields.map((f, i) => [f, 1 << i])) as Record<Field, number>;

// A word found in a name or tag says more about a motif than the same word in its notes.
export const FIELD_WEIGHTS: Record<Field, number> = { name: 1, tags: 1, originalName: 0.55, sourcePath: 0.45, notes: 0.3 };

// The best field weight of every combination of fields a word can come from.
const weightOfMask = Array.from({ length: 1 << fields.length }, (_, mask) => fields.reduce((best, f) => (mask & bit[f] && FIELD_WEIGHTS[f] > best ? FIELD_WEIGHTS[f] : best), 0));

// Fuse scores a match by its errors per letter (a swap of two letters is two errors): two
// errors from six letters on ("lantren" → "lantern" scores 0.29), one from four, none in a
// three-letter word, where one error already turns "sky" into "ske(tch)".
const FUSE_THRESHOLD = 0.34;
const allowedScore = (letters: number) => (letters >= 6 ? FUSE_THRESHOLD : letters >= 4 ? 0.26 : 0.01);
// Up to this many letters a word is matched as the start of a word only: "l" or "la" as
// someone starts typing would otherwise fuzzily match nearly everything.
const PREFIX_ONLY_LENGTH = 2;
const MAX_QUERY_WORDS = 6;

// Fuse.js over the studio's distinct words rather than over whole motifs: a typo-tolerant
// match over 10,000 motifs × 5 fields took about 200 ms a query (measured), over the few
// thousand distinct words it takes a few. Each word knows which motifs and fields it came from,
// and the field weights are applied here.
export class TextIndex {
  private postings = new Map<string, Map<string, number>>();
  private termsOf = new Map<string, Map<string, number>>();
  private fuse = new Fuse<string>([], { includeScore: true, threshold: FUSE_THRESHOLD, ignoreLocation: true, ignoreFieldNorm: true, shouldSort: false });
  private inFuse = new Set<string>();
  private deadInFuse = 0;

  get termCount() {
    return this.postings.size;
  }

  set(motifId: string, values: SearchableFields) {
    this.remove(motifId);
    const terms = new Map<string, number>();
    const addWords = (field: Field, text: string) => {
      for (const word of searchWords(text)) terms.set(word, (terms.get(word) ?? 0) | bit[field]);
    };
    addWords('name', values.name);
    for (const tag of values.tags) addWords('tags', tag);
    // "fox-walk.psd": the file type is in every original's name and says nothing.
    addWords('originalName', values.originalName.replace(/\.[a-z0-9]{2,4}$/i, ''));
    addWords('sourcePath', values.sourcePath);
    addWords('notes', values.notes);
    this.termsOf.set(motifId, terms);
    for (const [term, mask] of terms) {
      let posting = this.postings.get(term);
      if (!posting) {
        posting = new Map();
        this.postings.set(term, posting);
        if (!this.inFuse.has(term)) {
          this.fuse.add(term);
          this.inFuse.add(term);
        } else this.deadInFuse--;
      }
      posting.set(motifId, mask);
    }
  }

  remove(motifId: string) {
    const terms = this.termsOf.get(motifId);
    if (!terms) return;
    this.termsOf.delete(motifId);
    for (const term of terms.keys()) {
      const posting = this.postings.get(term);
      if (!posting) continue;
      posting.delete(motifId);
      if (posting.size === 0) {
        this.postings.delete(term);
        this.deadInFuse++;
      }
    }
    // Words no motif has any more stay in Fuse until they are a quarter of it.
    if (this.deadInFuse > 500 && this.deadInFuse > this.inFuse.size / 4) this.rebuildFuse();
  }

  private rebuildFuse() {
    const terms = [...this.postings.keys()];
    this.fuse.setCollection(terms);
    this.inFuse = new Set(terms);
    this.deadInFuse = 0;
  }

  // Relevance 0–1 per motif that matches every word of the query (null: the query has no words).
  search(query: string): Map<string, number> | null {
    const words = [...new Set(searchWords(query))].slice(0, MAX_QUERY_WORDS);
    if (words.length === 0) return null;
    let total: Map<string, number> | null = null;
    for (const word of words) {
      const best = new Map<string, number>();
      for (const [term, closeness] of this.matchingTerms(word)) {
        for (const [motifId, mask] of this.postings.get(term)!) {
          if (total && !total.has(motifId)) continue;
          const score = closeness * weightOfMask[mask];
          if (score > (best.get(motifId) ?? 0)) best.set(motifId, score);
        }
      }
      if (total) for (const [motifId, score] of best) best.set(motifId, total.get(motifId)! + score);
      total = best;
      if (total.size === 0) break;
    }
    for (const [motifId, sum] of total!) total!.set(motifId, sum / words.length);
    return total!;
  }

  // Closeness 0–1: the word itself, then words it starts (the user is still typing), then words
  // containing it or one or two typos away.
  private matchingTerms(word: string): Map<string, number> {
    const found = new Map<string, number>();
    if (word.length <= PREFIX_ONLY_LENGTH) {
      for (const term of this.postings.keys()) {
        if (term.startsWith(word)) found.set(term, term === word ? 1 : 0.9);
      }
      return found;
    }
    const limit = allowedScore(word.length);
    for (const { item: term, score = 1 } of this.fuse.search(word)) {
      if (score > limit || !this.postings.has(term)) continue;
      found.set(term, term === word ? 1 : term.startsWith(word) ? 0.95 : 0.85 * (1 - score));
    }
    return found;
  }
}
