/**
 * Real API server processes for the several-instances test: each one is src/main.ts (compiled once by
 * compiled-server.ts) on a port of its own, with the e2e run's environment (database, mail catcher, stand-ins), so
 * they share the database and the job queue exactly as replicas behind a load balancer would.
 *
 *   startApiInstances(names, env?) → ApiInstance[] once every GET /api/health answers 200 (all started in parallel;
 *                                    if one fails, every one started is stopped before the error is thrown)
 *   instance.logs(msg)             → the pino lines with that message the process has written so far
 *   stopApiInstances(instances)    → SIGTERM (the app's shutdown hooks), SIGKILL if one has not ended in time
 */
import { fork, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { compileServer } from './compiled-server';

const SERVER_ROOT = join(__dirname, '..', '..', '..');
const START_TIMEOUT_MS = 120_000;
const STOP_TIMEOUT_MS = 15_000;

export type LogLine = Record<string, unknown> & { msg?: string };

export interface ApiInstance {
  name: string;
  url: string;
  child: ChildProcess;
  logs(msg: string): LogLine[];
}

/** A port nobody listens on right now (the OS picks it); the instance binds it a moment later. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() =>
        typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port')),
      );
    });
  });
}

const exited = (child: ChildProcess) => child.exitCode !== null || child.signalCode !== null;

function waitUntilGone(child: ChildProcess, timeoutMs: number): Promise<boolean> {
  if (exited(child)) return Promise.resolve(true);
  return new Promise((resolve) => {
    const timer = setTimeout(() => resolve(false), timeoutMs);
    child.once('exit', () => {
      clearTimeout(timer);
      resolve(true);
    });
  });
}

async function stopOne(instance: ApiInstance): Promise<void> {
  const { child } = instance;
  if (exited(child)) return;
  child.kill('SIGTERM');
  if (await waitUntilGone(child, STOP_TIMEOUT_MS)) return;
  child.kill('SIGKILL');
  await waitUntilGone(child, STOP_TIMEOUT_MS);
}

export async function stopApiInstances(instances: readonly ApiInstance[]): Promise<void> {
  await Promise.all(instances.map(stopOne));
}

function spawnInstance(
  entry: string,
  name: string,
  port: number,
  env: NodeJS.ProcessEnv,
): ApiInstance & { output(): string } {
  const child = fork(entry, [], {
    cwd: SERVER_ROOT,
    env: {
      ...process.env,
      ...env,
      HOST: '127.0.0.1',
      PORT: String(port),
    },
    // Both streams are always read: a full pipe would stall the server mid-request.
    stdio: ['ignore', 'pipe', 'pipe', 'ipc'],
  });
  const lines: LogLine[] = [];
  let partial = '';
  let stderr = '';
  child.stdout?.on('data', (chunk: Buffer) => {
    const text = partial + chunk.toString('utf8');
    const complete = text.split('\n');
    partial = complete.pop() ?? '';
    for (const line of complete) {
      if (!line.startsWith('{')) continue;
      try {
        lines.push(JSON.parse(line) as LogLine);
      } catch {
        // A line that is not pino's JSON (a stray console.log) carries nothing the tests read.
      }
    }
  });
  child.stderr?.on('data', (chunk: Buffer) => (stderr = (stderr + chunk.toString('utf8')).slice(-4000)));
  return {
    name,
    url: `http://127.0.0.1:${port}`,
    child,
    logs: (msg) => lines.filter((line) => line.msg === msg),
    output: () => stderr,
  };
}

async function waitUntilHealthy(instance: ApiInstance & { output(): string }): Promise<void> {
  const deadline = Date.now() + START_TIMEOUT_MS;
  for (;;) {
    if (exited(instance.child)) {
      throw new Error(`API instance ${instance.name} exited while starting: ${instance.output()}`);
    }
    const status = await fetch(`${instance.url}/api/health`).then(
      (response) => response.status,
      () => 0,
    );
    if (status === 200) return;
    if (Date.now() > deadline) {
      throw new Error(`API instance ${instance.name} did not answer /api/health within ${START_TIMEOUT_MS / 1000} s`);
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

export async function startApiInstances(names: readonly string[], env: NodeJS.ProcessEnv = {}): Promise<ApiInstance[]> {
  const entry = compileServer();
  const ports = await Promise.all(names.map(() => freePort()));
  const instances = names.map((name, i) => spawnInstance(entry, name, ports[i]!, env));
  const started = await Promise.allSettled(instances.map(waitUntilHealthy));
  const failure = started.find((result): result is PromiseRejectedResult => result.status === 'rejected');
  if (failure) {
    await stopApiInstances(instances);
    throw failure.reason;
  }
  return instances;
}
