import { Global, Module } from '@nestjs/common';
import { UsersModule } from '../users/users.module.js';
import { FirstStartSeeder } from './first-start.seeder.js';

@Global()
@Module({ imports: [UsersModule], providers: [FirstStartSeeder], exports: [FirstStartSeeder] })
export class DemoModule {}
