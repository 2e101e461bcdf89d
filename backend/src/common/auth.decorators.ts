import { createParamDecorator, type ExecutionContext, SetMetadata } from '@nestjs/common';
import type { Role } from '@linkloom/shared';

export interface AuthUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  /** Set when the request came with a doc-set API token instead of a person's sign-in. */
  apiTokenDocSetId?: string;
}

export const IS_PUBLIC = 'linkloom:public';
export const MIN_ROLE = 'linkloom:min-role';

/** The route needs no sign-in (only sign-in and health are public). */
export const Public = (): MethodDecorator & ClassDecorator => SetMetadata(IS_PUBLIC, true);
/** The least role allowed; without it every signed-in role may call the route. */
export const MinRole = (role: Role): MethodDecorator & ClassDecorator => SetMetadata(MIN_ROLE, role);

export const CurrentUser = createParamDecorator((_: unknown, context: ExecutionContext): AuthUser => {
  return context.switchToHttp().getRequest<{ user: AuthUser }>().user;
});
