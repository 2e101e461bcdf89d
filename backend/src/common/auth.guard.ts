import { type CanActivate, type ExecutionContext, Inject, Injectable, Optional } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { roleAtLeast, type Role } from '@linkloom/shared';
import type { Request } from 'express';
import { AppError } from './app-error.js';
import { type AuthUser, IS_PUBLIC, MIN_ROLE } from './auth.decorators.js';
import { AccessTokenService } from '../modules/auth/access-token.service.js';

/** Resolves an API token (a CI job's credential) to the user it acts as; provided by the tokens module. */
export interface ApiTokenVerifier {
  verify(token: string): Promise<AuthUser | null>;
}
export const API_TOKEN_VERIFIER = Symbol('API_TOKEN_VERIFIER');
export const API_TOKEN_PREFIX = 'llk_';

const unauthenticated = (): AppError =>
  new AppError(401, 'UNAUTHENTICATED', 'Sign in first: the access token is missing, expired or not valid.');

/** Deny by default: every route needs a valid token unless marked @Public; @MinRole narrows it further. */
@Injectable()
export class AuthGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly accessTokens: AccessTokenService,
    @Optional() @Inject(API_TOKEN_VERIFIER) private readonly apiTokens?: ApiTokenVerifier,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;
    const request = context.switchToHttp().getRequest<Request & { user?: AuthUser }>();
    const user = await this.authenticate(request.headers.authorization);
    request.user = user;
    if (user.apiTokenDocSetId) this.checkTokenScope(request, user.apiTokenDocSetId);
    const minRole = this.reflector.getAllAndOverride<Role | undefined>(MIN_ROLE, targets);
    if (minRole && !roleAtLeast(user.role, minRole)) {
      throw new AppError(403, 'FORBIDDEN', `This action needs the ${minRole} role or higher; you are signed in as ${user.role}.`);
    }
    return true;
  }

  /** A CI token may read its own doc set and push snapshots or start runs there; nothing else. */
  private checkTokenScope(request: Request, docSetId: string): void {
    const ownDocSet = request.params?.docSetId === docSetId;
    const allowedWrite = request.method === 'POST' && /\/(snapshots|runs)$/.test(request.path);
    if (!ownDocSet || (request.method !== 'GET' && !allowedWrite)) {
      throw new AppError(403, 'FORBIDDEN', 'An API token may only read its own doc set, upload snapshots to it and start runs on it.');
    }
  }

  private async authenticate(header: string | undefined): Promise<AuthUser> {
    const match = /^Bearer ([^\s]{1,4096})$/.exec(header ?? '');
    if (!match) throw unauthenticated();
    const token = match[1];
    const user = token.startsWith(API_TOKEN_PREFIX) ? await this.apiTokens?.verify(token) : await this.accessTokens.verify(token);
    if (!user) throw unauthenticated();
    return user;
  }
}
