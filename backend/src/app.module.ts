import { type DynamicModule, Module } from '@nestjs/common';
import { APP_FILTER, APP_GUARD, APP_INTERCEPTOR } from '@nestjs/core';
import { ScheduleModule } from '@nestjs/schedule';
import { ThrottlerGuard, ThrottlerModule } from '@nestjs/throttler';
import { ResponseContractInterceptor } from './common/api-contract/response-contract.interceptor.js';
import { AllExceptionsFilter } from './common/exception.filter.js';
import { AuthGuard } from './common/auth.guard.js';
import { DomainEventsModule } from './common/events/domain-events.js';
import { LifecycleModule } from './common/lifecycle/lifecycle.module.js';
import { APP_CONFIG, type AppConfig } from './config/app-config.js';
import { DbModule } from './db/db.module.js';
import { AuditModule } from './modules/audit/audit.module.js';
import { AuthModule } from './modules/auth/auth.module.js';
import { BackupModule } from './modules/backup/backup.module.js';
import { DemoModule } from './modules/demo/demo.module.js';
import { HealthModule } from './modules/health/health.module.js';
import { UsersModule } from './modules/users/users.module.js';
import { FEATURE_MODULES } from './feature-modules.js';

@Module({})
export class AppModule {
  static register(config: AppConfig): DynamicModule {
    return {
      module: AppModule,
      global: true,
      imports: [
        ScheduleModule.forRoot(),
        ThrottlerModule.forRoot([{ name: 'default', ttl: 60_000, limit: 1_200 }]),
        LifecycleModule,
        DomainEventsModule,
        DbModule,
        AuditModule,
        AuthModule,
        UsersModule,
        DemoModule,
        HealthModule,
        BackupModule,
        ...FEATURE_MODULES,
      ],
      providers: [
        { provide: APP_CONFIG, useValue: config },
        { provide: APP_GUARD, useClass: ThrottlerGuard },
        { provide: APP_GUARD, useClass: AuthGuard },
        { provide: APP_FILTER, useClass: AllExceptionsFilter },
        // Not registered at all in production, so the check costs nothing there.
        ...(config.checkResponses ? [{ provide: APP_INTERCEPTOR, useClass: ResponseContractInterceptor }] : []),
      ],
      exports: [APP_CONFIG],
    };
  }
}
