/**
 * server/main.ts: start options, and the message when the port is taken (a real start in a child
 * process against a port this test holds).
 */
import { spawn } from 'node:child_process';
import { createServer, type Server } from 'node:net';
import type { AddressInfo } from 'node:net';
import { describe, expect, it } from 'vitest';
import { REPO_ROOT } from '../../server/http/bundle.js';
import { START_DEFAULTS, StartOptionError, parseStartOptions } from '../../server/main.js';

describe('parseStartOptions', () => {
  it('listens on 127.0.0.1:8151 by default', () => {
    expect(parseStartOptions([], {})).toEqual({ host: '127.0.0.1', port: 8151, help: false });
    expect(START_DEFAULTS.host).toBe('127.0.0.1');
  });

  it('takes the port from PORT, and from --port over PORT, in both spellings', () => {
    expect(parseStartOptions([], { PORT: '9001' }).port).toBe(9001);
    expect(parseStartOptions(['--port', '9002'], { PORT: '9001' }).port).toBe(9002);
    expect(parseStartOptions(['--port=9003'], {}).port).toBe(9003);
    expect(parseStartOptions(['--port', '0'], {}).port).toBe(0);
  });

  it('rejects a bad port naming where it came from and the allowed range', () => {
    expect(() => parseStartOptions(['--port', '70000'], {})).toThrow(/--port = "70000" is not a port: allowed whole numbers 0..65535/);
    expect(() => parseStartOptions([], { PORT: 'eighty' })).toThrow(/PORT = "eighty"/);
    expect(() => parseStartOptions(['--port'], {})).toThrow(StartOptionError);
  });

  it('rejects an unknown option', () => {
    expect(() => parseStartOptions(['--verbose'], {})).toThrow(/unknown option "--verbose"/);
  });
});

describe('npm start', () => {
  it('says clearly that the port is taken and exits 1', async () => {
    const holder: Server = await new Promise((resolve) => {
      const s = createServer().listen(0, '127.0.0.1', () => resolve(s));
    });
    const { port } = holder.address() as AddressInfo;
    try {
      const child = spawn(process.execPath, ['--import', 'tsx', 'server/main.ts', '--port', String(port)], { cwd: REPO_ROOT, env: { ...process.env, PORT: '' } });
      let stderr = '';
      child.stderr.on('data', (d) => (stderr += String(d)));
      const code = await new Promise<number | null>((resolve) => child.on('exit', resolve));
      expect(code).toBe(1);
      expect(stderr).toContain(`port ${port} on 127.0.0.1 is already in use`);
      expect(stderr).toContain('--port');
    } finally {
      await new Promise<void>((resolve) => holder.close(() => resolve()));
    }
  });
});
