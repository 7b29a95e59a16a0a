import { loadConfig } from './config.ts';
import { startServer } from './server.ts';

const config = loadConfig();
const server = await startServer(config).catch((error: NodeJS.ErrnoException) => {
  if (error.code === 'EADDRINUSE') {
    console.error(`[vatside] Port ${config.PORT} is already taken; set PORT to another port.`);
  } else {
    console.error('[vatside] The server could not start:', error);
  }
  process.exit(1);
});
server.deps.logger.info(
  { url: server.url, origin: config.PUBLIC_ORIGIN },
  'Vatside server listening',
);

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  server.deps.logger.info({ signal }, 'shutting down');
  const force = setTimeout(() => process.exit(1), 10_000);
  force.unref();
  await server.close();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
