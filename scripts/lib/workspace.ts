import { readFileSync } from 'node:fs';
import path from 'node:path';
import { repoRoot } from './paths.js';
import { mustRun, runCommand, type RunOptions } from './processes.js';
import { SetupError } from './setup-error.js';

export type Workspace = 'shared' | 'server' | 'client';

/** A workspace script that is not there is an error to fix, never a suite to skip. */
export function assertScript(workspace: Workspace, script: string): void {
  const manifest = path.join(repoRoot, workspace, 'package.json');
  let scripts: Record<string, string> | undefined;
  try {
    scripts = (JSON.parse(readFileSync(manifest, 'utf8')) as { scripts?: Record<string, string> }).scripts;
  } catch (error) {
    throw new SetupError(`Cannot read ${workspace}/package.json: ${(error as Error).message}`);
  }
  if (!scripts?.[script]) {
    throw new SetupError(`${workspace}/package.json has no "${script}" script: add it (the two commands rely on it).`);
  }
}

function npmArgs(workspace: Workspace, script: string, silent: boolean): string[] {
  return ['run', ...(silent ? ['-s'] : []), script, '-w', workspace];
}

export interface WorkspaceRunOptions extends RunOptions {
  /** npm's -s: only the script's own output. */
  silent?: boolean;
}

/** `npm run <script> -w <workspace>`; resolves with its exit code. */
export async function runScript(
  workspace: Workspace,
  script: string,
  options: WorkspaceRunOptions = {},
): Promise<number> {
  assertScript(workspace, script);
  return runCommand(`${workspace} ${script}`, 'npm', npmArgs(workspace, script, options.silent ?? false), {
    cwd: repoRoot,
    ...options,
    prefix: options.prefix ?? workspace,
  });
}

/** Like runScript, but failure throws with `hint`. */
export async function mustRunScript(
  workspace: Workspace,
  script: string,
  hint: string,
  options: WorkspaceRunOptions = {},
): Promise<void> {
  assertScript(workspace, script);
  await mustRun(`${workspace} ${script}`, 'npm', npmArgs(workspace, script, options.silent ?? false), hint, {
    cwd: repoRoot,
    ...options,
    prefix: options.prefix ?? workspace,
  });
}
