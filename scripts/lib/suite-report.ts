import { describeFailure } from './setup-error.js';

export interface StepResult {
  name: string;
  kind: 'suite' | 'setup';
  ok: boolean;
  seconds: number;
  note?: string;
}

/** Runs the steps of `npm test` one by one and remembers how each went, for the summary at the end. */
export class SuiteReport {
  readonly results: StepResult[] = [];
  private halted = false;

  /** After Ctrl-C nothing new starts. */
  halt(): void {
    this.halted = true;
  }

  /** `run` passes by resolving to 0 or undefined; any other code, or a throw, fails it. */
  async step(kind: StepResult['kind'], name: string, run: () => Promise<number | void>): Promise<boolean> {
    if (this.halted) return false;
    console.log(`\n▶ ${name}`);
    const started = performance.now();
    let ok = false;
    let note: string | undefined;
    try {
      const code = await run();
      ok = code === undefined || code === 0;
      if (!ok) note = `exit code ${String(code)}`;
    } catch (error) {
      note = describeFailure(error);
      console.error(note);
    }
    const seconds = (performance.now() - started) / 1000;
    this.results.push({ name, kind, ok, seconds, note });
    console.log(`${ok ? '✔' : '✘'} ${name} (${seconds.toFixed(1)} s)`);
    return ok;
  }

  /** A suite that could not run because what it needs failed: a failure, never a silent skip. */
  blocked(name: string, because: string): void {
    if (this.halted) return;
    this.results.push({ name, kind: 'suite', ok: false, seconds: 0, note: `not run: ${because}` });
    console.log(`\n✘ ${name}: not run (${because})`);
  }

  get failed(): boolean {
    return this.halted || this.results.length === 0 || this.results.some((result) => !result.ok);
  }

  print(): void {
    const width = Math.max(...this.results.map((result) => result.name.length), 10);
    const lines = this.results.map((result) => {
      const status = (result.ok ? 'pass' : 'FAIL').padEnd(6);
      const note = result.ok || !result.note ? '' : `  ${result.note.split('\n')[0]}`;
      return `  ${result.name.padEnd(width)}  ${status}  ${result.seconds.toFixed(1).padStart(7)}${note}`;
    });
    const total = this.results.reduce((sum, result) => sum + result.seconds, 0);
    const failures = this.results.filter((result) => !result.ok).length;
    console.log(
      [
        '',
        `  ${'step'.padEnd(width)}  result  ${'seconds'.padStart(7)}`,
        ...lines,
        '',
        this.halted
          ? `Interrupted after ${this.results.length} steps (${failures} failed): the rest did not run.`
          : failures === 0
            ? `All ${this.results.length} steps passed in ${total.toFixed(0)} s.`
            : `${failures} of ${this.results.length} steps failed (${total.toFixed(0)} s): scroll up to each one's output.`,
      ].join('\n'),
    );
  }
}
