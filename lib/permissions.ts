/**
 * Roles as data: what each of Leeway's four roles may do, declared once with better-auth's
 * access control. The server checks these for every page, action and route (lib/dal.ts); the
 * client uses the same object only to hide controls.
 */
import { createAccessControl } from 'better-auth/plugins/access';
import { defaultStatements } from 'better-auth/plugins/organization/access';

export const statements = {
  // better-auth's own (members, invitations, the organisation record).
  ...defaultStatements,
  project: ['create', 'read', 'update', 'delete'],
  case: ['create', 'read', 'update', 'delete', 'submit'],
  review: ['read', 'comment', 'decide'],
  boardPack: ['read', 'generate'],
  settings: ['read', 'update'],
  apiKey: ['create', 'read', 'revoke'],
} as const;

export const ac = createAccessControl(statements);

export const roles = {
  admin: ac.newRole({
    organization: ['update'],
    member: ['create', 'update', 'delete'],
    invitation: ['create', 'cancel'],
    project: ['create', 'read', 'update', 'delete'],
    case: ['create', 'read', 'update', 'delete'],
    review: ['read', 'comment'],
    boardPack: ['read', 'generate'],
    settings: ['read', 'update'],
    apiKey: ['create', 'read', 'revoke'],
  }),
  analyst: ac.newRole({
    project: ['create', 'read', 'update', 'delete'],
    case: ['create', 'read', 'update', 'delete', 'submit'],
    review: ['read', 'comment'],
    boardPack: ['read'],
    settings: ['read'],
  }),
  reviewer: ac.newRole({
    project: ['read'],
    case: ['read'],
    review: ['read', 'comment', 'decide'],
    boardPack: ['read', 'generate'],
    settings: ['read'],
  }),
  viewer: ac.newRole({
    project: ['read'],
    case: ['read'],
    boardPack: ['read'],
    settings: ['read'],
  }),
};

export type RoleName = keyof typeof roles;
export const roleNames = Object.keys(roles) as RoleName[];
export type Resource = keyof typeof statements;
export type Permission = { [R in Resource]?: (typeof statements)[R][number][] };

export const roleLabels: Record<RoleName, string> = {
  admin: 'Admin',
  analyst: 'Analyst',
  reviewer: 'Reviewer',
  viewer: 'Executive (read-only)',
};

export function isRoleName(value: string): value is RoleName {
  return (roleNames as string[]).includes(value);
}

/** Whether a role grants every action asked for. */
export function roleAllows(role: RoleName, permission: Permission): boolean {
  return roles[role].authorize(permission as never).success;
}
