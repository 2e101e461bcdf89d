import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { Cron } from '@nestjs/schedule';
import { mkdirSync, readdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { DbService } from '../../db/db.service.js';

export const BACKUP_PREFIX = 'linkloom-backup-';

/**
 * PGlite never fsyncs (its data survives a process kill, not a power cut), so a daily copy bounds the loss.
 * Also answers SIGUSR2 so `npm run backup` works while the server holds the data folder.
 */
@Injectable()
export class BackupService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('Backup');
  private readonly onSignal = () => void this.createBackup().catch((e) => this.logger.error(`Backup failed: ${String(e)}`));

  constructor(
    private readonly database: DbService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  get folder(): string {
    return join(this.config.dataDir, 'backups');
  }

  onApplicationBootstrap(): void {
    if (this.enabled) process.on('SIGUSR2', this.onSignal);
  }

  onApplicationShutdown(): void {
    process.off('SIGUSR2', this.onSignal);
  }

  private get enabled(): boolean {
    return this.database.kind === 'pglite' && !this.config.inMemoryDatabase;
  }

  @Cron('15 3 * * *')
  async nightly(): Promise<void> {
    if (this.enabled) await this.createBackup();
  }

  async createBackup(): Promise<string> {
    mkdirSync(this.folder, { recursive: true });
    const file = join(this.folder, `${BACKUP_PREFIX}${new Date().toISOString().replace(/[:.]/g, '-')}.tar.gz`);
    await this.database.backup(file);
    this.logger.log(`Backup written to ${file}`);
    const old = readdirSync(this.folder)
      .filter((f) => f.startsWith(BACKUP_PREFIX))
      .sort()
      .reverse()
      .slice(this.config.backupsKept);
    for (const name of old) rmSync(join(this.folder, name));
    return file;
  }
}
