/**
 * Benchmark of the link-graph engine against graphology-metrics pagerank on seeded synthetic doc graphs.
 * Run: npm run bench:graph [-- --sizes small,medium,large --damping 0.85 --tol 1e-6 --edges FILE]
 * Each measurement runs in a child process (clean peak RSS; a reference engine that runs out of memory
 * cannot end the run). Prints a table and one `BENCH {json}` line per measurement.
 */
import { spawn } from 'node:child_process';
import { cpus, loadavg } from 'node:os';
import { basename } from 'node:path';
import { fileURLToPath } from 'node:url';
import { measure, type MeasureJob, type Measurement } from './measure.js';

const SIZES = { small: [10_000, 100_000], medium: [100_000, 1_000_000], large: [1_000_000, 10_000_000] } as const;
const REFERENCE_BUDGET_MS = 60_000;
/** A reference run past 60 s already ends the comparison; 120 s lets it report how long it took. */
const KILL_MS = { linkloom: 600_000, graphology: 120_000 } as const;

interface Flags {
  sizes: Array<keyof typeof SIZES>;
  damping: number;
  tolerance: number;
  edgesFile?: string;
}

function parseFlags(argv: readonly string[]): Flags {
  const flags: Flags = { sizes: ['small', 'medium', 'large'], damping: 0.85, tolerance: 1e-6 };
  for (let i = 0; i < argv.length; i += 2) {
    const [name, value] = [argv[i], argv[i + 1]];
    if (value === undefined) throw new Error(`missing value for ${name}`);
    if (name === '--edges') flags.edgesFile = value;
    else if (name === '--damping') flags.damping = Number(value);
    else if (name === '--tol') flags.tolerance = Number(value);
    else if (name === '--sizes') flags.sizes = value.split(',').map((s) => checkSize(s.trim()));
    else throw new Error(`unknown flag ${name} (known: --edges, --damping, --tol, --sizes)`);
  }
  return flags;
}

function checkSize(size: string): keyof typeof SIZES {
  if (!(size in SIZES)) throw new Error(`unknown size ${size}; use small, medium, large`);
  return size as keyof typeof SIZES;
}

/** Runs one job in a child process; resolves with its measurements, or an error text. */
function runChild(job: MeasureJob): Promise<{ results: Measurement[]; error?: string; wallMs: number }> {
  const started = performance.now();
  return new Promise((resolve) => {
    const child = spawn(process.execPath, ['--expose-gc', fileURLToPath(import.meta.url), '--child', JSON.stringify(job)], {
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let out = '';
    let err = '';
    child.stdout.on('data', (chunk) => (out += chunk));
    child.stderr.on('data', (chunk) => (err += chunk));
    const killMs = KILL_MS[job.engine];
    const timer = setTimeout(() => child.kill('SIGKILL'), killMs);
    child.on('close', (code, signal) => {
      clearTimeout(timer);
      const wallMs = performance.now() - started;
      const line = out.split('\n').find((l) => l.startsWith('RESULT '));
      if (code === 0 && line) resolve({ results: JSON.parse(line.slice(7)) as Measurement[], wallMs });
      else
        resolve({
          results: [],
          wallMs,
          error: signal === 'SIGKILL' ? `killed after ${killMs / 1000} s` : `exit ${code ?? signal}: ${lastLine(err)}`,
        });
    });
  });
}

function lastLine(text: string): string {
  return (
    text
      .trim()
      .split('\n')
      .filter((l) => l.trim())
      .slice(-1)[0] ?? ''
  );
}

function report(m: Measurement): void {
  console.log(
    `BENCH ${JSON.stringify({ label: m.label, engine: m.engine, nodes: m.nodes, edges: m.edges, tolerance: m.tolerance, buildMs: round(m.buildMs), scoreMs: round(m.scoreMs), buildCpuMs: round(m.buildCpuMs), scoreCpuMs: round(m.scoreCpuMs), iterations: m.iterations, residual: m.residual, rssMb: m.rssMb, distinctEdges: m.distinctEdges, topScore: m.topScore })}`,
  );
}

const round = (ms: number) => Math.round(ms * 10) / 10;

function printTable(rows: Measurement[]): void {
  console.log('\nlabel      engine              tol     nodes      links       build ms  score ms  total ms   (cpu ms)  iter  peak RSS MB');
  for (const m of rows) {
    const cells = [
      m.label.padEnd(10),
      m.engine.padEnd(19),
      m.tolerance.toExponential(0).padEnd(7),
      String(m.nodes).padStart(9),
      String(m.edges).padStart(10),
      round(m.buildMs).toFixed(1).padStart(10),
      round(m.scoreMs).toFixed(1).padStart(9),
      round(m.buildMs + m.scoreMs)
        .toFixed(1)
        .padStart(9),
      `(${round(m.buildCpuMs + m.scoreCpuMs).toFixed(0)})`.padStart(10),
      String(m.iterations ?? '-').padStart(5),
      String(m.rssMb).padStart(12),
    ];
    console.log(cells.join(' '));
  }
}

function printComparison(rows: Measurement[], tolerance: number): void {
  for (const ref of rows.filter((m) => m.engine === 'graphology-metrics')) {
    const ours = rows.find((m) => m.engine === 'linkloom' && m.label === ref.label && m.tolerance === tolerance);
    if (!ours) continue;
    const ratio = (a: number, b: number) => (a / b).toFixed(1);
    console.log(
      `${ref.label}: linkloom vs graphology-metrics at tol ${tolerance}: build ${ratio(ref.buildMs, ours.buildMs)}x, score ${ratio(ref.scoreMs, ours.scoreMs)}x, build+score ${ratio(ref.buildMs + ref.scoreMs, ours.buildMs + ours.scoreMs)}x faster; top score ${ours.topScore.toExponential(9)} vs ${ref.topScore.toExponential(9)}`,
    );
  }
}

async function main(argv: readonly string[]): Promise<void> {
  const flags = parseFlags(argv);
  const tolerances = [...new Set([flags.tolerance, 1e-10])];
  const datasets = flags.edgesFile
    ? [{ label: `file:${basename(flags.edgesFile)}`, edgesFile: flags.edgesFile }]
    : flags.sizes.map((size) => ({ label: size, nodes: SIZES[size][0], edges: SIZES[size][1] }));
  console.log(`${cpus().length} cores, load average ${loadLine()} at start`);
  const rows: Measurement[] = [];
  let referenceSkipped = '';
  for (const data of datasets) {
    const ours = await runChild({ ...data, engine: 'linkloom', damping: flags.damping, tolerances });
    if (ours.error) console.log(`${data.label} linkloom failed: ${ours.error}`);
    ours.results.forEach(report);
    rows.push(...ours.results);
    if (referenceSkipped) {
      console.log(`${data.label} graphology-metrics skipped: ${referenceSkipped}`);
      continue;
    }
    const ref = await runChild({ ...data, engine: 'graphology', damping: flags.damping, tolerances: [flags.tolerance] });
    if (ref.error) console.log(`${data.label} graphology-metrics failed: ${ref.error}`);
    ref.results.forEach(report);
    rows.push(...ref.results);
    if (ref.error || ref.wallMs > REFERENCE_BUDGET_MS)
      referenceSkipped = `the previous size took ${(ref.wallMs / 1000).toFixed(0)} s (budget 60 s)`;
  }
  printTable(rows);
  printComparison(rows, flags.tolerance);
  console.log(`load average ${loadLine()} at end (other work on the machine inflates wall times)`);
}

const loadLine = () =>
  loadavg()
    .map((l) => l.toFixed(2))
    .join(' ');

if (process.argv[2] === '--child') {
  const results = measure(JSON.parse(process.argv[3]) as MeasureJob);
  process.stdout.write(`RESULT ${JSON.stringify(results)}\n`);
} else {
  main(process.argv.slice(2)).catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  });
}
