import { spawn, type SpawnOptions } from 'node:child_process';
import net from 'node:net';
import readline from 'node:readline';
import type { Readable, Writable } from 'node:stream';
import { SetupError } from './setup-error.js';

export interface ExitResult {
  code: number | null;
  signal: NodeJS.Signals | null;
}

export interface ManagedChild {
  readonly name: string;
  readonly pid: number;
  readonly exited: Promise<ExitResult>;
  hasExited(): boolean;
  /** SIGTERM to the whole process group, then SIGKILL after graceMs. */
  stop(graceMs?: number): Promise<ExitResult>;
}

export interface SpawnManagedOptions {
  cwd?: string;
  env?: NodeJS.ProcessEnv;
  /** Output prefix; defaults to the child's name. */
  prefix?: string;
}

const liveGroups = new Set<number>();

// Anything still running when this process ends (even on an uncaught error) dies with it.
process.on('exit', () => {
  for (const pid of liveGroups) killGroup(pid, 'SIGKILL');
});

function killGroup(pid: number, signal: NodeJS.Signals): void {
  try {
    process.kill(-pid, signal);
  } catch {
    // ESRCH: the group is already gone.
  }
}

function forward(stream: Readable | null, prefix: string, target: Writable): void {
  if (!stream) return;
  const lines = readline.createInterface({ input: stream, crlfDelay: Infinity });
  lines.on('line', (line) => target.write(`${prefix} ${line}\n`));
}

/** Starts a child in its own process group (so stopping it stops its children too) and prefixes its output. */
export function spawnManaged(
  name: string,
  command: string,
  args: readonly string[],
  options: SpawnManagedOptions = {},
): ManagedChild {
  // Output goes through a pipe, so tools would drop colour at a terminal and keep it in CI logs unless told.
  const env = { ...(options.env ?? process.env) };
  if (process.stdout.isTTY) env.FORCE_COLOR = '1';
  else {
    delete env.FORCE_COLOR;
    env.NO_COLOR = '1';
  }
  const spawnOptions: SpawnOptions = {
    cwd: options.cwd,
    env,
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
  };
  const child = spawn(command, args, spawnOptions);
  const prefix = `[${options.prefix ?? name}]`;
  forward(child.stdout, prefix, process.stdout);
  forward(child.stderr, prefix, process.stderr);

  let done = false;
  const exited = new Promise<ExitResult>((resolve) => {
    child.once('error', (error) => {
      process.stderr.write(`${prefix} could not start ${command}: ${error.message}\n`);
      done = true;
      resolve({ code: 127, signal: null });
    });
    child.once('exit', (code, signal) => {
      done = true;
      const pid = child.pid;
      if (pid !== undefined) {
        // Whatever the child left behind in its group is a leak: clear it so its pipes close.
        killGroup(pid, 'SIGTERM');
        liveGroups.delete(pid);
      }
      const result = { code, signal };
      const fallback = setTimeout(() => resolve(result), 2000);
      child.once('close', () => {
        clearTimeout(fallback);
        resolve(result);
      });
    });
  });

  const pid = child.pid ?? -1;
  if (pid > 0) liveGroups.add(pid);

  return {
    name,
    pid,
    exited,
    hasExited: () => done,
    async stop(graceMs = 10_000) {
      if (done || pid <= 0) return exited;
      killGroup(pid, 'SIGTERM');
      const timer = setTimeout(() => killGroup(pid, 'SIGKILL'), graceMs);
      const result = await exited;
      clearTimeout(timer);
      return result;
    },
  };
}

export interface RunOptions extends SpawnManagedOptions {
  /** Stop the command after this long and count it as failed. */
  timeoutMs?: number;
}

/** Runs a command to its end with prefixed output; resolves with the exit code (non-zero on signal or timeout). */
export async function runCommand(
  name: string,
  command: string,
  args: readonly string[],
  options: RunOptions = {},
): Promise<number> {
  const child = spawnManaged(name, command, args, options);
  let timedOut = false;
  const timer =
    options.timeoutMs === undefined
      ? undefined
      : setTimeout(() => {
          timedOut = true;
          process.stderr.write(`[${name}] still running after ${options.timeoutMs! / 1000} s: stopping it\n`);
          void child.stop(5000);
        }, options.timeoutMs);
  const { code, signal } = await child.exited;
  if (timer) clearTimeout(timer);
  if (timedOut) return 124;
  if (signal) return 128 + (signalNumbers[signal] ?? 1);
  return code ?? 1;
}

/** Like runCommand, but a non-zero exit throws a SetupError carrying `hint`. */
export async function mustRun(
  name: string,
  command: string,
  args: readonly string[],
  hint: string,
  options: RunOptions = {},
): Promise<void> {
  const code = await runCommand(name, command, args, options);
  if (code !== 0) {
    throw new SetupError(`${name} failed (\`${[command, ...args].join(' ')}\` exited with ${code}).\n${hint}`);
  }
}

const signalNumbers: Partial<Record<NodeJS.Signals, number>> = { SIGHUP: 1, SIGINT: 2, SIGKILL: 9, SIGTERM: 15 };

/** True when nothing listens on host:port (we could bind it ourselves). */
export function isPortFree(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = net.createServer();
    probe.once('error', () => resolve(false));
    probe.listen({ port, host, exclusive: true }, () => probe.close(() => resolve(true)));
  });
}

/** Throws a message naming the port, what usually holds it, and how to choose another. */
export async function assertPortFree(
  port: number,
  what: string,
  howToChange: string,
  host = '127.0.0.1',
): Promise<void> {
  if (await isPortFree(port, host)) return;
  throw new SetupError(
    `Port ${port} on ${host} is already taken, so ${what} cannot start there.\n` +
      `  See what holds it:  ss -ltnp 'sport = :${port}'\n` +
      `  Stop that program (an earlier run still going in another terminal?), or pick another port: ${howToChange}`,
  );
}

/** A port the OS says is free right now on loopback. */
export function freePort(host = '127.0.0.1'): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once('error', reject);
    probe.listen({ port: 0, host }, () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

/** Polls a URL until it answers (any HTTP status) or the child dies or time runs out. */
export async function waitForHttp(url: string, child: ManagedChild, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.hasExited()) {
      throw new SetupError(`${child.name} exited before answering on ${url}: read its output above.`);
    }
    try {
      await fetch(url, { signal: AbortSignal.timeout(2000) });
      return;
    } catch {
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
  }
  throw new SetupError(`${child.name} did not answer on ${url} within ${timeoutMs / 1000} s: read its output above.`);
}

type Step = { label: string; run: () => unknown; emergency?: () => void; done: boolean };

/** Things to undo, newest first, exactly once, whether the command ends normally, fails or is interrupted. */
export class Teardown {
  private readonly steps: Step[] = [];
  private running: Promise<void> | undefined;

  constructor() {
    // If the process ends before a step ran (a crash, a forced quit), its synchronous fallback still runs.
    process.on('exit', () => {
      for (const step of [...this.steps].reverse()) if (!step.done) step.emergency?.();
    });
  }

  /** `emergency` must be synchronous: it is all that can run while the process exits. */
  add(label: string, run: () => unknown, emergency?: () => void): void {
    this.steps.push({ label, run, emergency, done: false });
  }

  get started(): boolean {
    return this.running !== undefined;
  }

  run(): Promise<void> {
    this.running ??= (async () => {
      for (const step of [...this.steps].reverse()) {
        try {
          await step.run();
          step.done = true;
        } catch (error) {
          process.stderr.write(`Could not ${step.label}: ${error instanceof Error ? error.message : String(error)}\n`);
        }
      }
    })();
    return this.running;
  }
}

/**
 * On SIGINT, SIGTERM or SIGHUP: run the teardown, then exit 130/143/129. A second Ctrl-C (a moment after the
 * first, so one keypress seen twice does not count) kills what is left at once.
 */
export function stopOnSignals(teardown: Teardown, onSignal?: (signal: NodeJS.Signals) => void): void {
  let firstAt = 0;
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
    process.on(signal, () => {
      if (firstAt > 0) {
        if (Date.now() - firstAt < 1000) return;
        process.stderr.write('\nSecond signal: killing what is left without waiting.\n');
        process.exit(128 + (signalNumbers[signal] ?? 1));
      }
      firstAt = Date.now();
      process.stderr.write(`\n${signal} received: stopping everything this command started…\n`);
      onSignal?.(signal);
      // Children run in their own process groups, so the terminal's Ctrl-C never reached them: pass it on.
      for (const pid of liveGroups) killGroup(pid, 'SIGTERM');
      void teardown.run().finally(() => process.exit(128 + (signalNumbers[signal] ?? 1)));
    });
  }
}
