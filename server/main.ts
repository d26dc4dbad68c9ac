/**
 * `npm start`: builds the viewer if needed, starts the server on 127.0.0.1 and prints its URL.
 *
 *   npm start                      port 8151 (or $PORT)
 *   npm start -- --port 9000       another port (0: any free port)
 *   npm start -- --host 0.0.0.0    listen beyond this machine (at your own risk: no authentication)
 */
import type { AddressInfo } from 'node:net';
import { createApp } from './app.js';
import { ensureViewerBundle } from './http/bundle.js';

/** Defaults of the start script. */
export const START_DEFAULTS = Object.freeze({ host: '127.0.0.1', port: 8151 });

/** Start options from the command line and the environment. */
export interface StartOptions {
  host: string;
  port: number;
  /** --help was given: print USAGE and exit. */
  help: boolean;
}

export const USAGE = 'usage: npm start -- [--port N] [--host ADDRESS]   (default 127.0.0.1:8151; PORT=N also sets the port)';

/** Error in the start options (printed as one line; exit code 2). */
export class StartOptionError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'StartOptionError';
  }
}

function parsePort(text: string, source: string): number {
  const port = Number(text);
  if (!/^\d+$/.test(text.trim()) || !Number.isInteger(port) || port < 0 || port > 65535) {
    throw new StartOptionError(`${source} = ${JSON.stringify(text)} is not a port: allowed whole numbers 0..65535`);
  }
  return port;
}

/**
 * Reads --port / --host (also as --port=N) and the PORT variable; the command line wins.
 * @param argv arguments after the script. @param env environment (PORT).
 * @throws StartOptionError for an unknown option or a bad port.
 */
export function parseStartOptions(argv: readonly string[], env: NodeJS.ProcessEnv): StartOptions {
  const options: StartOptions = { ...START_DEFAULTS, help: false };
  if (env.PORT !== undefined && env.PORT !== '') options.port = parsePort(env.PORT, 'PORT');
  for (let i = 0; i < argv.length; i++) {
    const [flag, inline] = argv[i].split(/=(.*)/s, 2);
    const value = () => {
      const v = inline ?? argv[++i];
      if (v === undefined) throw new StartOptionError(`${flag} needs a value`);
      return v;
    };
    if (flag === '--port') options.port = parsePort(value(), '--port');
    else if (flag === '--host') options.host = value();
    else if (flag === '--help' || flag === '-h') options.help = true;
    else throw new StartOptionError(`unknown option ${JSON.stringify(argv[i])}: allowed --port N, --host ADDRESS`);
  }
  return options;
}

async function start(): Promise<void> {
  let options: StartOptions;
  try {
    options = parseStartOptions(process.argv.slice(2), process.env);
  } catch (error) {
    process.stderr.write(`loomline: ${(error as Error).message}\n`);
    process.stderr.write(`${USAGE}\n`);
    process.exitCode = 2;
    return;
  }
  if (options.help) {
    process.stdout.write(`${USAGE}\n`);
    return;
  }
  if (await ensureViewerBundle()) process.stdout.write('loomline: built the viewer (dist/web/app.js)\n');
  const { app, warm, close } = createApp();
  const server = app.listen(options.port, options.host);
  server.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EADDRINUSE') {
      process.stderr.write(`loomline: port ${options.port} on ${options.host} is already in use; choose another with --port N (or PORT=N), or stop the program using it\n`);
    } else if (error.code === 'EACCES') {
      process.stderr.write(`loomline: not allowed to listen on ${options.host}:${options.port}; choose a port above 1023 with --port N\n`);
    } else {
      process.stderr.write(`loomline: cannot listen on ${options.host}:${options.port}: ${error.message}\n`);
    }
    process.exitCode = 1;
    void close();
  });
  server.on('listening', () => {
    const { port } = server.address() as AddressInfo;
    const host = options.host.includes(':') ? `[${options.host}]` : options.host;
    process.stdout.write(`loomline: viewer at http://${host}:${port}/  (Ctrl+C stops)\n`);
    warm().catch((error: unknown) => process.stderr.write(`loomline: could not warm the compute threads: ${error instanceof Error ? error.message : String(error)}\n`));
  });
  const stop = () => server.close(() => void close().finally(() => process.exit(0)));
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  start().catch((error: unknown) => {
    process.stderr.write(`loomline: could not start: ${error instanceof Error ? error.message : String(error)}\n`);
    process.exitCode = 1;
  });
}
