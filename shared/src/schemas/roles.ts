import { z } from 'zod';

/** Roles, from most to least powerful. Order matters: `roleAtLeast` compares positions. */
export const ROLES = ['admin', 'editor', 'writer', 'viewer'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

export function roleAtLeast(role: Role, minimum: Role): boolean {
  return ROLES.indexOf(role) <= ROLES.indexOf(minimum);
}
