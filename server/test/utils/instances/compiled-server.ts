import { mkdirSync, readdirSync, readFileSync, renameSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import ts from 'typescript';

const SERVER_ROOT = join(__dirname, '..', '..', '..');
/** Under server/node_modules, so the compiled files resolve the same package versions the sources do. */
const OUT_DIR = join(SERVER_ROOT, 'node_modules', '.cache', 'keenroute-e2e', 'server');
const ENTRY = join('test', 'utils', 'instances', 'api-instance.ts');

function sourceFiles(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const path = join(folder, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return entry.name.endsWith('.ts') && !entry.name.endsWith('.spec.ts') && !entry.name.endsWith('.d.ts')
      ? [path]
      : [];
  });
}

function compilerOptions(): ts.CompilerOptions {
  const parsed = ts.getParsedCommandLineOfConfigFile(join(SERVER_ROOT, 'tsconfig.json'), undefined, {
    ...ts.sys,
    onUnRecoverableConfigFileDiagnostic: (diagnostic) => {
      throw new Error(ts.flattenDiagnosticMessageText(diagnostic.messageText, '\n'));
    },
  });
  if (!parsed) throw new Error('server/tsconfig.json could not be read');
  // The server is a CommonJS package: one file at a time to CommonJS, decorator metadata as the real build emits it.
  return {
    ...parsed.options,
    module: ts.ModuleKind.CommonJS,
    moduleResolution: undefined,
    noEmit: false,
    declaration: false,
    sourceMap: false,
  };
}

/**
 * The server's sources as JavaScript, for starting several server processes quickly: each one booted with ts-node
 * would transpile every file again (about 15-30 s apiece on a busy machine); here it happens once per test run, and
 * a file is transpiled again only when its source changed since. Type checking stays with `npm run typecheck`.
 * Returns the compiled entry point (api-instance.js), beside a mirror of src/.
 */
export function compileServer(): string {
  const options = compilerOptions();
  const files = [...sourceFiles(join(SERVER_ROOT, 'src')), join(SERVER_ROOT, ENTRY)];
  for (const file of files) {
    const target = join(OUT_DIR, relative(SERVER_ROOT, file)).replace(/\.ts$/, '.js');
    const compiledAt = statSync(target, { throwIfNoEntry: false })?.mtimeMs ?? 0;
    if (compiledAt >= statSync(file).mtimeMs) continue;
    const { outputText } = ts.transpileModule(readFileSync(file, 'utf8'), { compilerOptions: options, fileName: file });
    mkdirSync(dirname(target), { recursive: true });
    // Written aside and renamed: a run stopped halfway must not leave a cut-off file that looks up to date.
    writeFileSync(`${target}.${process.pid}.tmp`, outputText);
    renameSync(`${target}.${process.pid}.tmp`, target);
  }
  return join(OUT_DIR, ENTRY).replace(/\.ts$/, '.js');
}
