import { cpus, loadavg, totalmem } from 'node:os';

/** One line of the closing table: what was measured, the figure as measured, and its target. */
export interface Figure {
  task: string;
  measured: string;
  target: string;
}

/** The machine a run measured on, with its load at the end (other jobs sharing the cores skew figures). */
export function machineLine(): string {
  const cpu = cpus();
  const load = loadavg()
    .map((n) => n.toFixed(1))
    .join(' ');
  return `${cpu.length} × ${cpu[0]?.model.trim() ?? 'unknown CPU'}, ${(totalmem() / 2 ** 30).toFixed(1)} GB, Node ${process.version}, ${process.platform}; load average ${load} at the end; ${new Date().toISOString()}`;
}

/** Prints the figures as one plain table. */
export function printTable(title: string, figures: Figure[]): void {
  const widths = [
    Math.max(4, ...figures.map((f) => f.task.length)),
    Math.max(8, ...figures.map((f) => f.measured.length)),
    Math.max(6, ...figures.map((f) => f.target.length)),
  ];
  const row = (cells: string[]) => `| ${cells.map((c, i) => c.padEnd(widths[i])).join(' | ')} |`;
  console.log(`\n${title}`);
  console.log(row(['task', 'measured', 'target']));
  console.log(row(widths.map((w) => '-'.repeat(w))));
  for (const f of figures) console.log(row([f.task, f.measured, f.target]));
  console.log(`machine: ${machineLine()}`);
}
