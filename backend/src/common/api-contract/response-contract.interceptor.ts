import { type CallHandler, type ExecutionContext, Injectable, Logger, type NestInterceptor } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { contractProblems } from '@linkloom/shared';
import { map, type Observable } from 'rxjs';
import { AppError } from '../app-error.js';
import { RESPONSE_CONTRACT, type ResponseContract } from './api-response.decorators.js';

/**
 * Holds every answer to the shape its route documents (development and tests; off in production, where it
 * is not even registered). The body is checked as it goes on the wire (after JSON encoding, so dates are
 * strings), against the shared schema and for fields the schema does not describe. A mismatch is a 500
 * naming the field, so drift between server and screens shows up in the first test that calls the route.
 */
@Injectable()
export class ResponseContractInterceptor implements NestInterceptor {
  private readonly logger = new Logger('ResponseContract');

  constructor(private readonly reflector: Reflector) {}

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const contract = this.reflector.get<ResponseContract | undefined>(RESPONSE_CONTRACT, context.getHandler());
    const request = context.switchToHttp().getRequest<{ method: string; path?: string; url: string }>();
    const route = `${request.method} ${request.path ?? request.url}`;
    if (!contract)
      throw this.broken(route, ['the route declares no response contract (ApiZodResponse, ApiNoContentResponse or ApiFileResponse)']);
    return next.handle().pipe(map((body) => this.check(contract, route, body)));
  }

  private check(contract: ResponseContract, route: string, body: unknown): unknown {
    if (contract.kind === 'file') return body;
    if (contract.kind === 'none') {
      if (body !== undefined) throw this.broken(route, ['a 204 route returned a body']);
      return body;
    }
    const wire: unknown = body === undefined ? undefined : JSON.parse(JSON.stringify(body));
    const problems = contractProblems(contract.schema, wire);
    if (problems.length > 0) throw this.broken(route, problems, contract.name);
    return body;
  }

  private broken(route: string, problems: string[], name?: string): AppError {
    const message = `The answer to ${route} does not match its response schema${name ? ` ${name}` : ''}: ${problems.join('; ')}`;
    this.logger.error(message);
    return new AppError(500, 'RESPONSE_CONTRACT', message, problems);
  }
}
