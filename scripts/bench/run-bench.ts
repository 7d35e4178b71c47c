// npm run bench: pipeline cost for a 50 Hz hour and the /bench first-load JS; writes bench-results/bench.json.
import { mkdirSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { measureBundle } from './measure-bundle';
import { measurePipeline } from './measure-pipeline';

const root = path.resolve(__dirname, '../..');
const pipeline = measurePipeline(50, 3600);
// Other processes preempt the loop: the load average tells whether the tail figures are the code's or the machine's.
const loadAverage = os.loadavg()[0];
const bundle = measureBundle(root);
mkdirSync(path.join(root, 'bench-results'), { recursive: true });
const out = path.join(root, 'bench-results/bench.json');
writeFileSync(out, JSON.stringify({ at: new Date().toISOString(), node: process.version, cpus: os.cpus().length, loadAverage, pipeline, bundle }, null, 2));

const kb = (b: number) => `${(b / 1024).toFixed(1)} kB`;
console.log(`pipeline, ${pipeline.rateHz} Hz for one simulated hour (${pipeline.readings} readings):`);
console.log(
  `  per reading: mean ${pipeline.meanUs.toFixed(2)} µs, p50 ${pipeline.p50Us.toFixed(2)} µs, p99 ${pipeline.p99Us.toFixed(2)} µs, p99.9 ${pipeline.p999Us.toFixed(2)} µs, max ${pipeline.maxUs.toFixed(0)} µs (budget ${pipeline.periodUs} µs)`,
);
console.log(
  `  dropped (slower than one period): ${pipeline.dropped}; trace kept ${pipeline.traceKept} readings; CPU ${(pipeline.cpuShareOfRealTime * 100).toFixed(3)} % of real time`,
);
console.log(`  machine: ${os.cpus().length} cores, load average ${loadAverage.toFixed(2)} during the run (slow tail readings are mostly preemption)`);
console.log(`/bench first-load JS: ${bundle.files} files, ${kb(bundle.bytes)} (${kb(bundle.gzipBytes)} gzip)`);
console.log(
  `  ag-grid in first load: ${bundle.dataGridInFirstLoad ? 'YES' : 'no'}; chart in first load: ${bundle.chartInFirstLoad ? 'yes' : 'no'}${bundle.lazyChartChunk ? `, loaded on demand: ${kb(bundle.lazyChartChunk.bytes)} (${kb(bundle.lazyChartChunk.gzipBytes)} gzip)` : ''}`,
);
console.log(`written to ${path.relative(root, out)}`);
if (bundle.dataGridInFirstLoad) process.exitCode = 1;
