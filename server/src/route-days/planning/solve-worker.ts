import { parentPort, workerData } from 'node:worker_threads';
import { matrixFromArrays } from '../solver/matrix';
import { solve } from '../solver/solve';
import type { Solution, SolverInput } from '../solver/types';
import type { MatrixArrays } from './travel-matrix.service';

/** What crosses into the worker: the solver's input with the matrix as plain arrays. */
export type WorkerInput = Omit<SolverInput, 'matrix'> & { matrix: Pick<MatrixArrays, 'minutes' | 'km'> };

export function solveArrays(input: WorkerInput): Solution {
  return solve({ ...input, matrix: matrixFromArrays({ minutes: input.matrix.minutes, distance: input.matrix.km }) });
}

if (parentPort && workerData) {
  parentPort.postMessage(solveArrays(workerData as WorkerInput));
}
