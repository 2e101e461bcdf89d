import { Global, Module } from '@nestjs/common';
import { API_TOKEN_VERIFIER } from '../../common/auth.guard.js';
import { DocSetsModule } from '../doc-sets/doc-sets.module.js';
import { ApiTokensController } from './api-tokens.controller.js';
import { ApiTokensRepository } from './api-tokens.repository.js';
import { ApiTokensService } from './api-tokens.service.js';

@Global()
@Module({
  imports: [DocSetsModule],
  controllers: [ApiTokensController],
  providers: [ApiTokensRepository, ApiTokensService, { provide: API_TOKEN_VERIFIER, useExisting: ApiTokensService }],
  exports: [API_TOKEN_VERIFIER],
})
export class ApiTokensModule {}
