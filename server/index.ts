import 'reflect-metadata';
import type { Server } from 'node:http';
import pino from 'pino';
import { createApp } from './app';
import { ConfigError, loadConfig } from './config';
import { createDataSource } from './data-source';
import { createMailer } from './mail/mailer';
import { repoRoot } from './paths';
import { DEMO_PASSWORD, DEMO_USERS, seed, SeedError } from './seed/seed';

async function main(): Promise<void> {
  let config;
  try {
    config = loadConfig(process.env, repoRoot());
  } catch (e) {
    if (e instanceof ConfigError) {
      console.error(`Tessera server: bad configuration: ${e.message}`);
      process.exit(2);
    }
    throw e;
  }
  const logger = pino({ level: config.logLevel });
  const ds = createDataSource(config.databasePath);
  await ds.initialize(); // runs pending migrations
  const mailer = createMailer(ds, config, logger);
  const app = createApp({ dataSource: ds, config, mailer, logger });
  try {
    await seed(ds, app.locals.services.auth, config.libraryDataDir, logger);
  } catch (e) {
    if (e instanceof SeedError) {
      console.error(`Tessera server: library-data is invalid, nothing was seeded: ${e.message}`);
      await ds.destroy();
      process.exit(3);
    }
    throw e;
  }

  const server: Server = app.listen(config.port, config.host);
  await new Promise<void>((resolve, reject) => {
    server.once('listening', resolve);
    server.once('error', reject);
  });
  const addr = server.address();
  const port = typeof addr === 'object' && addr ? addr.port : config.port;
  const url = `http://${config.host}:${port}`;
  console.log(`Tessera is running at ${url}`);
  console.log(`Demo sign-ins (password "${DEMO_PASSWORD}", invented demo accounts):`);
  for (const u of DEMO_USERS) console.log(`  ${u.role.padEnd(8)} ${u.email}`);
  console.log(`Mail: ${mailer.transport === 'smtp' ? `SMTP ${config.smtp?.host}` : 'local outbox (admins: GET /api/admin/outbox)'}`);

  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'shutting down');
    const force = setTimeout(() => process.exit(1), 5000);
    (force as { unref?: () => void }).unref?.();
    server.close(async () => {
      mailer.close();
      await ds.destroy().catch(() => undefined);
      process.exit(0);
    });
    server.closeAllConnections?.();
  };
  process.on('SIGTERM', () => stop('SIGTERM'));
  process.on('SIGINT', () => stop('SIGINT'));
}

main().catch((e) => {
  console.error('Tessera server failed to start:', e instanceof Error ? e.message : e);
  process.exit(1);
});
