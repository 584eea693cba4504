import type { ImportKind } from '../import-kinds';
import { customersHandler } from './customers.kind';
import { runnerFor, type ImportRunner } from './import-handler';
import { shearsHandler } from './shears.kind';
import { stopsHandler } from './stops.kind';

export const IMPORT_RUNNERS: Readonly<Record<ImportKind, ImportRunner>> = {
  stops: runnerFor(stopsHandler),
  customers: runnerFor(customersHandler),
  shears: runnerFor(shearsHandler),
};
