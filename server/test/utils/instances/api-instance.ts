/**
 * One API server process for the several-instances test: the real main.ts (its own port, pool, pg-boss and workers),
 * compiled by compiled-server.ts and started by api-instances.ts with fork, so it has an IPC channel to the test.
 */
import '../../../src/main';

// The channel closes when the test process ends in any way (even killed): the server goes with it at once, as if
// killed itself, never an orphan holding its port and database connections. Nobody is left to read its exit status.
process.on('disconnect', () => process.kill(process.pid, 'SIGKILL'));
