import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { UsersRepository } from '../users/users.repository.js';
import { UsersService } from '../users/users.service.js';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-accounts.js';

/** Listeners that add demo content after the demo users exist (the demo doc set registers here). */
export const DEMO_CONTENT_SEEDERS = Symbol('DEMO_CONTENT_SEEDERS');
export interface DemoContentSeeder {
  seed(): Promise<void>;
}

/** On an empty database: the demo users (DEMO, the default) or a single admin from ADMIN_EMAIL/ADMIN_PASSWORD. */
@Injectable()
export class FirstStartSeeder implements OnApplicationBootstrap {
  private readonly logger = new Logger('FirstStart');
  private readonly contentSeeders: DemoContentSeeder[] = [];

  constructor(
    private readonly usersRepository: UsersRepository,
    private readonly users: UsersService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** Called by modules that seed demo content (kept as a list so the demo module needs no import of them). */
  registerContentSeeder(seeder: DemoContentSeeder): void {
    this.contentSeeders.push(seeder);
  }

  async onApplicationBootstrap(): Promise<void> {
    if ((await this.usersRepository.count()) > 0) return;
    if (this.config.demo) {
      for (const account of DEMO_ACCOUNTS) await this.users.create(null, { ...account, password: DEMO_PASSWORD });
      this.logger.log(
        `Demo data: sign in as ${DEMO_ACCOUNTS.map((a) => a.email).join(', ')} with the password "${DEMO_PASSWORD}" (set DEMO=false to start without demo data).`,
      );
      if (this.config.demoContent) for (const seeder of this.contentSeeders) await seeder.seed();
      return;
    }
    const { adminEmail, adminPassword } = this.config;
    if (!adminEmail || !adminPassword) {
      this.logger.warn('No users yet and DEMO=false: set ADMIN_EMAIL and ADMIN_PASSWORD and restart to create the first admin.');
      return;
    }
    await this.users.create(null, { email: adminEmail, name: 'Administrator', role: 'admin', password: adminPassword });
    this.logger.log(`Created the first admin ${adminEmail}.`);
  }
}
