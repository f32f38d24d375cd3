/**
 * The permission matrix, role × action, written out in full: any change to lib/permissions.ts
 * that moves a single cell fails this test, so a change of who may do what is always deliberate.
 */
import { describe, expect, it } from 'vitest';
import { roleAllows, roleNames, statements, type Resource, type RoleName } from '@/lib/permissions';

type Cell = Record<RoleName, boolean>;
const Y = true;
const N = false;
const row = (admin: boolean, analyst: boolean, reviewer: boolean, viewer: boolean): Cell => ({ admin, analyst, reviewer, viewer });

const matrix: Record<string, Cell> = {
  //                              admin analyst reviewer viewer
  'organization:update': row(Y, N, N, N),
  'organization:delete': row(N, N, N, N),
  'member:create': row(Y, N, N, N),
  'member:update': row(Y, N, N, N),
  'member:delete': row(Y, N, N, N),
  'invitation:create': row(Y, N, N, N),
  'invitation:cancel': row(Y, N, N, N),
  'team:create': row(N, N, N, N),
  'team:update': row(N, N, N, N),
  'team:delete': row(N, N, N, N),
  'ac:create': row(N, N, N, N),
  'ac:read': row(N, N, N, N),
  'ac:update': row(N, N, N, N),
  'ac:delete': row(N, N, N, N),
  'project:create': row(Y, Y, N, N),
  'project:read': row(Y, Y, Y, Y),
  'project:update': row(Y, Y, N, N),
  'project:delete': row(Y, Y, N, N),
  'case:create': row(Y, Y, N, N),
  'case:read': row(Y, Y, Y, Y),
  'case:update': row(Y, Y, N, N),
  'case:delete': row(Y, Y, N, N),
  'case:submit': row(N, Y, N, N),
  'review:read': row(Y, Y, Y, N),
  'review:comment': row(Y, Y, Y, N),
  'review:decide': row(N, N, Y, N),
  'boardPack:read': row(Y, Y, Y, Y),
  'boardPack:generate': row(Y, N, Y, N),
  'settings:read': row(Y, Y, Y, Y),
  'settings:update': row(Y, N, N, N),
  'apiKey:create': row(Y, N, N, N),
  'apiKey:read': row(Y, N, N, N),
  'apiKey:revoke': row(Y, N, N, N),
};

describe('permission matrix', () => {
  it('lists every action of every statement', () => {
    const all = Object.entries(statements).flatMap(([resource, actions]) => actions.map((a) => `${resource}:${a}`));
    expect(Object.keys(matrix).sort()).toEqual(all.sort());
  });

  it.each(Object.entries(matrix))('%s', (cell, expected) => {
    const [resource, action] = cell.split(':') as [Resource, string];
    const actual = Object.fromEntries(roleNames.map((role) => [role, roleAllows(role, { [resource]: [action] } as never)]));
    expect(actual).toEqual(expected);
  });
});
