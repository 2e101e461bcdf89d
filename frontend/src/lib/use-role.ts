import { roleAtLeast, type Role } from '@linkloom/shared';
import { useSession } from './session.js';

/** Whether the signed-in user holds at least `minimum` (admin > editor > writer > viewer). */
export function useRoleAtLeast(minimum: Role): boolean {
  const role = useSession()?.user.role;
  return role ? roleAtLeast(role, minimum) : false;
}
