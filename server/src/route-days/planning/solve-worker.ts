import { parentPort, workerData } from 'node:worker_threads';
import { solve } from '../solver/solve';
import type { Solution, SolverInput, TravelMatrix } from '../solver/types';
import type { MatrixArrays } from './travel-matrix.service';

/** What crosses into the worker: the solver's input with the matrix as plain arrays. */
export type WorkerInput = Omit<SolverInput, 'matrix'> & { matrix: Pick<MatrixArrays, 'minutes' | 'km'> };

export function fromArrays(arrays: Pick<MatrixArrays, 'minutes' | 'km'>): TravelMatrix {
  return {
    size: arrays.minutes.length,
    minutes: (from, to) => arrays.minutes[from]![to]!,
    distance: (from, to) => arrays.km[from]![to]!,
  };
}

export function solveArrays(input: WorkerInput): Solution {
  return solve({ ...input, matrix: fromArrays(input.matrix) });
}

if (parentPort && workerData) {
  parentPort.postMessage(solveArrays(workerData as WorkerInput));
}
