import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export type RunningServer = { url: string; dbFile: string; proc: ChildProcess; output: () => string; stop: () => Promise<void> };

// Starts the built server on a free port with a fresh database file.
export async function startServer(env: Record<string, string> = {}, reuseDbFile?: string): Promise<RunningServer> {
  const dbFile = reuseDbFile ?? path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'motewalk-e2e-')), 'motewalk.sqlite');
  const proc = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    // 10,000 particles per demo run keep seeding to seconds with engine 2.0 and still decide the no-control options.
    env: { ...process.env, PORT: '0', DATABASE_FILE: dbFile, LOG_REQUESTS: '0', NODE_ENV: 'test', DEMO_PARTICLES: '10000', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  proc.stdout!.on('data', (d) => (output += d));
  proc.stderr!.on('data', (d) => (output += d));
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start:\n${output}`)), 60_000);
    proc.stdout!.on('data', () => {
      const m = /running on (http:\/\/localhost:\d+)/.exec(output);
      if (m) {
        clearTimeout(timer);
        resolve(m[1]);
      }
    });
    proc.on('exit', (code) => reject(new Error(`server exited with ${code}:\n${output}`)));
  });
  return {
    url,
    dbFile,
    proc,
    output: () => output,
    stop: () =>
      new Promise((resolve) => {
        if (proc.exitCode !== null) return resolve();
        proc.once('exit', () => resolve());
        proc.kill('SIGTERM');
      }),
  };
}
