// The shipped WOFF files as URLs Vite fingerprints and serves with the app (keys as in
// shared/text/shipped-fonts.ts: `${id}-${weight}-${subset}`).
import caveat600Latin from '@fontsource/caveat/files/caveat-latin-600-normal.woff?url';
import caveat600LatinExt from '@fontsource/caveat/files/caveat-latin-ext-600-normal.woff?url';
import fraunces600Latin from '@fontsource/fraunces/files/fraunces-latin-600-normal.woff?url';
import fraunces600LatinExt from '@fontsource/fraunces/files/fraunces-latin-ext-600-normal.woff?url';
import pacifico400Latin from '@fontsource/pacifico/files/pacifico-latin-400-normal.woff?url';
import pacifico400LatinExt from '@fontsource/pacifico/files/pacifico-latin-ext-400-normal.woff?url';
import sourceSans400Latin from '@fontsource/source-sans-3/files/source-sans-3-latin-400-normal.woff?url';
import sourceSans400LatinExt from '@fontsource/source-sans-3/files/source-sans-3-latin-ext-400-normal.woff?url';
import sourceSans700Latin from '@fontsource/source-sans-3/files/source-sans-3-latin-700-normal.woff?url';
import sourceSans700LatinExt from '@fontsource/source-sans-3/files/source-sans-3-latin-ext-700-normal.woff?url';

export const fontFileUrls: Readonly<Record<string, string>> = {
  'source-sans-3-400-latin': sourceSans400Latin,
  'source-sans-3-400-latin-ext': sourceSans400LatinExt,
  'source-sans-3-700-latin': sourceSans700Latin,
  'source-sans-3-700-latin-ext': sourceSans700LatinExt,
  'fraunces-600-latin': fraunces600Latin,
  'fraunces-600-latin-ext': fraunces600LatinExt,
  'caveat-600-latin': caveat600Latin,
  'caveat-600-latin-ext': caveat600LatinExt,
  'pacifico-400-latin': pacifico400Latin,
  'pacifico-400-latin-ext': pacifico400LatinExt,
};
