// Tailwind 4 reads its theme from CSS (`src/styles.css`, `@theme`); this file keeps the
// palette's names in one typed place for code that needs them outside CSS (canvas overlays).
export const motifoldPalette = {
  ink: '#1f2a30',       // body text, dark UI
  tide: '#1d6f6a',      // primary actions
  tideDeep: '#155551',  // primary hover
  kelp: '#5d7a3a',      // success / ok
  ochre: '#c7891f',     // warnings
  rust: '#b4452f',      // problems, destructive
  shell: '#f6f1e8',     // page background
  sand: '#e7dfd0',      // borders, quiet fills
} as const;

export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
};
