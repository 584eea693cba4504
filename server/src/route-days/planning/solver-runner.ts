import { Injectable } from '@nestjs/common';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import { DomainError } from '../../common/errors/domain-error';
import type { Solution } from '../solver/types';
import type { WorkerInput } from './solve-worker';

/** Solves running at once in one API process; a third planner waits its turn rather than starving requests. */
const CONCURRENT_SOLVES = 2;
/** Past the solver's own budget (it has a wall-clock safety net), the worker is stopped outright; the slack covers a
 * cold start (under jest the worker compiles the TypeScript first). */
const HARD_STOP_FACTOR = 4;
const HARD_STOP_SLACK_MS = 20_000;

/**
 * Runs the route solver in a worker thread, one thread per solve: planning a week is rare and takes seconds, so a
 * pool would only keep idle threads, and a one-off thread can be terminated if it overruns. The API's event loop stays
 * free for other requests meanwhile.
 */
@Injectable()
export class SolverRunner {
  private running = 0;
  private readonly waiting: (() => void)[] = [];

  async solve(input: WorkerInput): Promise<Solution> {
    await this.slot();
    try {
      return await runWorker(input);
    } finally {
      this.running--;
      this.waiting.shift()?.();
    }
  }

  private async slot(): Promise<void> {
    while (this.running >= CONCURRENT_SOLVES) await new Promise<void>((resolve) => this.waiting.push(resolve));
    this.running++;
  }
}

function runWorker(input: WorkerInput): Promise<Solution> {
  // Built: the compiled .js beside this file. Under ts-jest or tsx: the .ts source through ts-node's register hook.
  const compiled = path.join(__dirname, 'solve-worker.js');
  const worker = existsSync(compiled)
    ? new Worker(compiled, { workerData: input })
    : new Worker(
        `require('ts-node').register({ transpileOnly: true }); require(${JSON.stringify(path.join(__dirname, 'solve-worker.ts'))});`,
        { eval: true, workerData: input },
      );
  return new Promise<Solution>((resolve, reject) => {
    const timer = setTimeout(
      () => {
        void worker.terminate();
        reject(new DomainError('conflict', 'Planning took too long and was stopped; try again with fewer stops.'));
      },
      input.timeLimitMs * HARD_STOP_FACTOR + HARD_STOP_SLACK_MS,
    );
    worker.once('message', (solution: Solution) => {
      clearTimeout(timer);
      resolve(solution);
      void worker.terminate();
    });
    worker.once('error', (error) => {
      clearTimeout(timer);
      reject(error);
    });
    worker.once('exit', (code) => {
      clearTimeout(timer);
      if (code !== 0) reject(new Error(`The solver's worker stopped with code ${code}.`));
    });
  });
}
