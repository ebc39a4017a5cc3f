import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { permissionTable, studioRoles } from '../../../shared/auth/permissions';

describe('the README role table', () => {
  it('says exactly what the permission table enforces', () => {
    const readme = readFileSync(new URL('../../../README.md', import.meta.url), 'utf8');
    const block = readme.split('<!-- role-table:start -->')[1].split('<!-- role-table:end -->')[0];
    const rows = block.trim().split('\n').slice(2).map((line) => line.split('|').slice(1, -1).map((c) => c.trim()));
    const expected = Object.entries(permissionTable).map(([name, p]) => [
      name,
      p.label,
      ...studioRoles.map((role) => ((p.roles as readonly string[]).includes(role) ? 'yes' : '–')),
    ]);
    expect(rows).toEqual(expected);
  });
});
