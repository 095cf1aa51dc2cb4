import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';

/**
 * A private redis-server (Debian's package) for one test file: on 127.0.0.1 at
 * VITEST_REDIS_PORT (6390 unless set), no persistence, its dir under .data/. Started
 * and stopped by the test, so a test can take Redis away and bring it back.
 */
export class TestRedis {
  readonly port = Number(process.env.VITEST_REDIS_PORT ?? 6390);
  readonly url = `redis://127.0.0.1:${this.port}/0`;
  private child: ChildProcess | null = null;

  async start(): Promise<void> {
    const bin = ['/usr/bin/redis-server', '/usr/sbin/redis-server'].find((p) => existsSync(p));
    if (!bin)
      throw new Error('redis-server is not installed: run scripts/ensure-system.sh (Debian package redis-server)');
    const dir = path.join(process.cwd(), '.data', `redis-test-${this.port}`);
    mkdirSync(dir, { recursive: true });
    this.child = spawn(
      bin,
      ['--port', String(this.port), '--bind', '127.0.0.1', '--save', '', '--appendonly', 'no', '--dir', dir],
      { stdio: 'ignore' },
    );
    for (let i = 0; i < 100; i++) {
      if (await this.answers()) return;
      await new Promise((r) => setTimeout(r, 50));
    }
    throw new Error(`redis-server did not answer on 127.0.0.1:${this.port} within 5 s`);
  }

  async stop(): Promise<void> {
    const child = this.child;
    this.child = null;
    if (!child || child.exitCode !== null) return;
    const gone = new Promise((r) => child.once('exit', r));
    child.kill('SIGKILL');
    await gone;
  }

  private answers(): Promise<boolean> {
    return new Promise((resolve) => {
      const s = net.connect(this.port, '127.0.0.1');
      s.once('connect', () => {
        s.write('PING\r\n');
        s.once('data', (d) => {
          s.destroy();
          resolve(d.toString().startsWith('+PONG'));
        });
      });
      s.once('error', () => resolve(false));
    });
  }
}
