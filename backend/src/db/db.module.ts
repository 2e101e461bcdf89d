import { Global, Module } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { DbService } from './db.service.js';

@Global()
@Module({
  providers: [
    {
      provide: DbService,
      inject: [APP_CONFIG],
      useFactory: async (config: AppConfig) => {
        const service = new DbService(config);
        await service.open();
        return service;
      },
    },
  ],
  exports: [DbService],
})
export class DbModule {}
