import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { auditListSchema, listQuerySchema } from '@linkloom/shared';
import { z } from 'zod';
import { MinRole } from '../../common/auth.decorators.js';
import { ApiZodQuery, ZodPipe } from '../../common/zod-pipe.js';
import { AuditService } from './audit.service.js';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';

const auditQuerySchema = listQuerySchema
  .extend({ entityType: z.string().max(64).optional(), entityId: z.string().max(1024).optional(), docSetId: z.string().uuid().optional() })
  .strict();

@ApiTags('audit')
@ApiBearerAuth()
@MinRole('editor')
@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @ApiZodQuery(auditQuerySchema)
  @ApiZodResponse(auditListSchema)
  list(@Query(new ZodPipe(auditQuerySchema)) query: z.infer<typeof auditQuerySchema>) {
    return this.audit.list(query, query.page, query.pageSize);
  }
}
