import { describe, expect, it } from 'vitest';
import { displaySourcePath, sourcePathParts } from './source-path';

describe('showing a layer’s source path', () => {
  it('splits groups from layers and keeps slashes that belong to a name', () => {
    expect(sourcePathParts('Waves/Wave \\/ band')).toEqual(['Waves', 'Wave / band']);
    expect(sourcePathParts('Back\\\\slash')).toEqual(['Back\\slash']);
    expect(displaySourcePath('Puffins/Left puffin/Beak')).toBe('Puffins / Left puffin / Beak');
  });
});
