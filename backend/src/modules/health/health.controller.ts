import { Controller, Get, Inject } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { readFileSync } from 'node:fs';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { Public } from '../../common/auth.decorators.js';
import { DbService } from '../../db/db.service.js';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import { healthSchema } from '@linkloom/shared';

const VERSION = (JSON.parse(readFileSync(new URL('../../../package.json', import.meta.url), 'utf8')) as { version: string }).version;

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(
    private readonly database: DbService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  @Public()
  @Get()
  @ApiZodResponse(healthSchema)
  health() {
    return { status: 'ok', database: this.database.kind, version: VERSION, demo: this.config.demo };
  }
}
