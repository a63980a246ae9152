// No outside values here: the import graph of src/ as the architecture test reads it.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, normalize, relative } from 'node:path';

/** Every .ts file under dir, as a path relative to the repository root. */
export function sourceFiles(dir = 'src'): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out.push(...sourceFiles(path));
    else if (name.endsWith('.ts') && !name.endsWith('.d.ts')) out.push(path);
  }
  return out.sort();
}

// Static imports and re-exports (`from '...'`, type-only ones too: they tie the modules' meanings
// together) and dynamic `import('...')` (loaded later, but still a dependency).
const SPEC = /(?:\bfrom\s*|\bimport\s*\(\s*|^\s*import\s+)['"](\.{1,2}\/[^'"]+)['"]/gm;

/** file -> the src files it imports. */
export function importGraph(files: string[]): Map<string, string[]> {
  const known = new Set(files);
  const graph = new Map<string, string[]>();
  for (const file of files) {
    const text = readFileSync(file, 'utf8');
    const deps = new Set<string>();
    for (const m of text.matchAll(SPEC)) {
      const target = normalize(join(dirname(file), m[1])).replace(/\.js$/, '.ts');
      if (known.has(target)) deps.add(target);
    }
    graph.set(file, [...deps].sort());
  }
  return graph;
}

/** The unit a file belongs to: its folder under src/, and for src/kinds/<kind>/ the kind's folder. */
export function unitOf(file: string): string {
  const parts = relative('src', file).split(/[\\/]/);
  if (parts.length === 1) return '.';
  if (parts[0] === 'kinds' && parts.length > 2) return `kinds/${parts[1]}`;
  return parts[0];
}

/** Strongly connected components of more than one node (or a node importing itself): the cycles. */
export function cycles(graph: Map<string, string[]>): string[][] {
  let index = 0;
  const idx = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const on = new Set<string>();
  const out: string[][] = [];
  const visit = (v: string) => {
    idx.set(v, index);
    low.set(v, index);
    index++;
    stack.push(v);
    on.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!idx.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (on.has(w)) low.set(v, Math.min(low.get(v)!, idx.get(w)!));
    }
    if (low.get(v) === idx.get(v)) {
      const scc: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        on.delete(w);
        scc.push(w);
      } while (w !== v);
      if (scc.length > 1 || (graph.get(v) ?? []).includes(v)) out.push(scc.sort());
    }
  };
  for (const v of graph.keys()) if (!idx.has(v)) visit(v);
  return out;
}

/** The graph between units (folders), each edge with the file imports that make it. */
export function unitGraph(graph: Map<string, string[]>): Map<string, Map<string, string[]>> {
  const out = new Map<string, Map<string, string[]>>();
  for (const [file, deps] of graph) {
    const u = unitOf(file);
    if (!out.has(u)) out.set(u, new Map());
    for (const d of deps) {
      const t = unitOf(d);
      if (t === u) continue;
      const edges = out.get(u)!;
      if (!edges.has(t)) edges.set(t, []);
      edges.get(t)!.push(`${file} -> ${d}`);
    }
  }
  return out;
}
