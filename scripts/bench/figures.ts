// What every bench run says about itself, and where its figures go: appended to the bench's own JSON
// list in bench-results/, so runs can be compared over commits.
import { execSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export function runStamp(bench: string) {
  return {
    bench,
    at: new Date().toISOString(),
    commit: execSync('git rev-parse --short HEAD').toString().trim(),
    node: process.version,
    cores: os.availableParallelism(),
  };
}

export function appendFigures(file: string, figures: object): void {
  mkdirSync(path.dirname(file), { recursive: true });
  const previous = existsSync(file) ? (JSON.parse(readFileSync(file, 'utf8')) as unknown[]) : [];
  writeFileSync(file, JSON.stringify([...previous, figures], null, 2) + '\n');
}
