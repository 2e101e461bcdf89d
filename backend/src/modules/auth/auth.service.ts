import { Injectable } from '@nestjs/common';
import type { ChangePasswordInput, SignInInput, SignInResult, UserDetails } from '@linkloom/shared';
import { AppError, notFound } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { AuditService } from '../audit/audit.service.js';
import { toUserDetails, UsersRepository } from '../users/users.repository.js';
import { AccessTokenService } from './access-token.service.js';
import { DUMMY_HASH, hashPassword, verifyPassword } from './password-hasher.js';
import { SignInLimiter } from './sign-in-limiter.js';

/** One message for unknown e-mail, wrong password and disabled account, so none can be told apart. */
const SIGN_IN_FAILED = 'The e-mail or password is not correct, or the account is disabled.';

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersRepository,
    private readonly tokens: AccessTokenService,
    private readonly limiter: SignInLimiter,
    private readonly audit: AuditService,
  ) {}

  async signIn(input: SignInInput): Promise<SignInResult> {
    const wait = this.limiter.retryAfter(input.email);
    if (wait > 0) {
      throw new AppError(429, 'TOO_MANY_SIGN_IN_ATTEMPTS', `Too many failed sign-ins for this account. Try again in ${wait} seconds.`, [
        { retryAfterSeconds: wait },
      ]);
    }
    const user = await this.users.findByEmail(input.email);
    const passwordOk = await verifyPassword(input.password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !passwordOk || user.disabled) {
      this.limiter.recordFailure(input.email);
      throw new AppError(401, 'SIGN_IN_FAILED', SIGN_IN_FAILED);
    }
    this.limiter.reset(input.email);
    await this.users.update(user.id, { lastSignInAt: new Date() });
    const token = await this.tokens.issue(user.id, user.tokenVersion);
    return { ...token, user: { id: user.id, email: user.email, name: user.name, role: user.role } };
  }

  async signOut(actor: AuthUser): Promise<void> {
    await this.users.bumpTokenVersion(actor.id);
  }

  async me(actor: AuthUser): Promise<UserDetails> {
    const user = await this.users.findById(actor.id);
    if (!user) throw notFound('The user');
    return toUserDetails(user);
  }

  async changePassword(actor: AuthUser, input: ChangePasswordInput): Promise<SignInResult> {
    const user = await this.users.findById(actor.id);
    if (!user) throw notFound('The user');
    if (!(await verifyPassword(input.currentPassword, user.passwordHash))) {
      throw new AppError(400, 'WRONG_PASSWORD', 'The current password is not correct.');
    }
    await this.users.update(user.id, { passwordHash: await hashPassword(input.newPassword) });
    await this.users.bumpTokenVersion(user.id);
    await this.audit.record(actor, 'user.password-changed', 'user', user.id);
    const token = await this.tokens.issue(user.id, user.tokenVersion + 1);
    return { ...token, user: { id: user.id, email: user.email, name: user.name, role: user.role } };
  }
}
