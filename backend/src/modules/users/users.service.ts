import { Injectable } from '@nestjs/common';
import type { CreateUserInput, ListResult, UpdateUserInput, UserDetails } from '@linkloom/shared';
import { AppError, conflict, notFound } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { AuditService } from '../audit/audit.service.js';
import { hashPassword } from '../auth/password-hasher.js';
import { toUserDetails, UsersRepository } from './users.repository.js';

@Injectable()
export class UsersService {
  constructor(
    private readonly users: UsersRepository,
    private readonly audit: AuditService,
  ) {}

  async list(page: number, pageSize: number): Promise<ListResult<UserDetails>> {
    const { rows, total } = await this.users.list((page - 1) * pageSize, pageSize);
    return { items: rows.map(toUserDetails), total, page, pageSize };
  }

  /** The user when they exist and may sign in, else null (for links that act on a person's behalf). */
  async findActive(id: string): Promise<UserDetails | null> {
    const row = await this.users.findById(id);
    return row && !row.disabled ? toUserDetails(row) : null;
  }

  async findActiveByEmail(email: string): Promise<UserDetails | null> {
    const row = await this.users.findByEmail(email);
    return row && !row.disabled ? toUserDetails(row) : null;
  }

  async create(actor: AuthUser | null, input: CreateUserInput): Promise<UserDetails> {
    if (await this.users.findByEmail(input.email)) {
      throw conflict('EMAIL_TAKEN', `A user with the e-mail ${input.email} already exists.`);
    }
    const row = await this.users.insert({
      email: input.email,
      name: input.name,
      role: input.role,
      passwordHash: await hashPassword(input.password),
    });
    await this.audit.record(actor, 'user.created', 'user', row.id, { email: row.email, role: row.role });
    return toUserDetails(row);
  }

  async update(actor: AuthUser, id: string, input: UpdateUserInput): Promise<UserDetails> {
    const current = await this.users.findById(id);
    if (!current) throw notFound('The user');
    if (id === actor.id && ((input.role !== undefined && input.role !== current.role) || input.disabled === true)) {
      throw new AppError(403, 'FORBIDDEN', 'You cannot change your own role or disable yourself; ask another admin.');
    }
    const losesAdmin = current.role === 'admin' && !current.disabled && ((input.role && input.role !== 'admin') || input.disabled === true);
    if (losesAdmin && (await this.users.countActiveAdminsExcept(id)) === 0) {
      throw conflict('LAST_ADMIN', 'This is the last active admin; make another user admin first.');
    }
    const row = await this.users.update(id, input);
    if (!row) throw notFound('The user');
    if (input.disabled === true || (input.role && input.role !== current.role)) await this.users.bumpTokenVersion(id);
    await this.audit.record(actor, 'user.updated', 'user', id, {
      email: row.email,
      before: { role: current.role, disabled: current.disabled, name: current.name },
      after: { role: row.role, disabled: row.disabled, name: row.name },
    });
    return toUserDetails(row);
  }
}
