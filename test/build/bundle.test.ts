// The installed command is the launcher and bundle the build writes (package.json bin): it must say
// exactly what the source says, load its lazy parts (HTML report, CSV) when asked, find its
// pre-validated catalog, and start from its code cache. A property of our own build, no outside
// values. Needs `npm run build` (npm ci runs it).
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cli, tempPath } from '../helpers.js';

const pkg = JSON.parse(readFileSync('package.json', 'utf8')) as { bin: Record<string, string>; version: string };
const bin = pkg.bin.coilfront;
const built = (...args: string[]) => {
  const r = spawnSync(process.execPath, [bin, ...args], { encoding: 'utf8' });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
};

describe('the built command', () => {
  it('exists where package.json bin points, as an executable script', () => {
    expect(existsSync(bin), `${bin} is missing: npm ci or npm run build writes it`).toBe(true);
    expect(readFileSync(bin, 'utf8').startsWith('#!/usr/bin/env node\n')).toBe(true);
  });

  it('prints what the source prints for the demo design, byte for byte', async () => {
    const fromSource = await cli('design', 'examples/washer-trigger.yaml', '--json');
    const fromBundle = built('design', 'examples/washer-trigger.yaml', '--json');
    expect(fromBundle.code).toBe(fromSource.code);
    expect(fromBundle.stdout).toBe(fromSource.stdout);
    expect(fromBundle.stderr).toBe(fromSource.stderr);
  });

  it('loads the HTML report and the CSV writer when a command asks for them', () => {
    const report = tempPath('bundle-report.html');
    const r = built('frontier', 'examples/washer-trigger.yaml', '--report', report);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout.split('\n')[0]).toMatch(/^rank,material,ends,wire_diameter_mm,/);
    expect(readFileSync(report, 'utf8')).toMatch(/^<!doctype html>/i);
    rmSync(report);
  });

  it('starts from the code cache the build recorded, and runs the same without it', () => {
    const withCache = spawnSync(process.execPath, [bin, '--version'], { encoding: 'utf8', env: { ...process.env, COILFRONT_DEBUG: '1' } });
    expect(withCache.stderr).toBe('coilfront: code cache used\n');
    const bundle = bin.replace(/coilfront\.cjs$/, 'coilfront-bundle.cjs');
    const plain = spawnSync(process.execPath, [bundle, 'design', 'examples/washer-trigger.yaml'], { encoding: 'utf8' });
    expect(plain.status).toBe(0);
    expect(plain.stdout).toBe(built('design', 'examples/washer-trigger.yaml').stdout);
  });

  it('answers --version with the package version and bad input with exit 2, no stack trace', () => {
    expect(execFileSync(process.execPath, [bin, '--version'], { encoding: 'utf8' }).trim()).toBe(pkg.version);
    const bad = built('design', 'examples/no-such-file.yaml');
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/^coilfront: error: examples\/no-such-file\.yaml/);
    expect(bad.stderr).not.toMatch(/\n\s+at /);
  });
});
