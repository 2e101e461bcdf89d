import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { fileURLToPath } from 'node:url';
import { ConfigError, loadConfig } from './config/app-config.js';
import { createApp } from './create-app.js';

const logger = new Logger('Linkloom');

try {
  const config = loadConfig(process.env, { frontendDist: fileURLToPath(new URL('../../frontend/dist', import.meta.url)) });
  const app = await createApp(config);
  await app.listen(config.port, config.host);
  const url = await app.getUrl();
  logger.log(
    `Linkloom is running at ${url.replace('[::1]', 'localhost').replace('127.0.0.1', 'localhost').replace('0.0.0.0', 'localhost')} (API docs at /api/docs)`,
  );
} catch (error) {
  const code = (error as { code?: string }).code;
  if (error instanceof ConfigError || code === 'DATA_DIR_LOCKED' || code === 'DATA_DIR_UNREADABLE') {
    console.error(`\n${(error as Error).message}\n`);
  } else {
    console.error(error);
  }
  process.exit(1);
}
