import { Injectable } from '@nestjs/common';
import type { UserDetails } from '@linkloom/shared';
import { AppError } from '../../common/app-error.js';
import { UsersService } from '../users/users.service.js';
import { canBeAssignee } from './task-access.js';

/** Who can be given a task: writers, editors and admins that can sign in. */
@Injectable()
export class TaskAssignees {
  constructor(private readonly users: UsersService) {}

  async list(): Promise<{ id: string; name: string; email: string; role: string }[]> {
    const { items } = await this.users.list(1, 500);
    return items.filter((u) => !u.disabled && canBeAssignee(u.role)).map((u) => ({ id: u.id, name: u.name, email: u.email, role: u.role }));
  }

  async require(id: string): Promise<UserDetails> {
    const user = await this.users.findActive(id);
    if (!user) throw new AppError(422, 'ASSIGNEE_NOT_FOUND', 'The assignee does not exist or cannot sign in.');
    if (!canBeAssignee(user.role))
      throw new AppError(422, 'ASSIGNEE_ROLE', `${user.name} is a viewer; tasks go to writers, editors or admins.`);
    return user;
  }

  /** Front-matter owners that name a user who can take the work, by lower-case e-mail. */
  async ownersByEmail(emails: (string | null)[]): Promise<Map<string, UserDetails>> {
    const result = new Map<string, UserDetails>();
    for (const email of new Set(emails.filter((e): e is string => !!e).map((e) => e.toLowerCase()))) {
      const user = await this.users.findActiveByEmail(email);
      if (user && canBeAssignee(user.role)) result.set(email, user);
    }
    return result;
  }
}
