/**
 * The board route's JavaScript at first load, gzipped: the entry chunk, the board route's chunk, and every chunk
 * they import statically (what the browser must fetch before the board can draw), read from Vite's manifest.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { ROOT } from './support.js';

interface Chunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
}

const DIST = join(ROOT, 'apps/web/dist');

function firstLoad(manifest: Record<string, Chunk>, keys: string[]): Set<string> {
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key) || !manifest[key]) return;
    seen.add(key);
    for (const dep of manifest[key].imports ?? []) visit(dep);
  };
  keys.forEach(visit);
  return seen;
}

export function benchBundle(): Promise<Record<string, string>> {
  const manifest = JSON.parse(readFileSync(join(DIST, '.vite/manifest.json'), 'utf8')) as Record<string, Chunk>;
  const entry = Object.keys(manifest).find((k) => manifest[k]!.isEntry);
  if (!entry) throw new Error('no entry in the Vite manifest: run "npm run build" first');
  const sizes = (keys: Set<string>) => {
    let raw = 0;
    let gz = 0;
    for (const k of keys) {
      const bytes = readFileSync(join(DIST, manifest[k]!.file));
      raw += bytes.length;
      gz += gzipSync(bytes, { level: 9 }).length;
    }
    return { raw, gz };
  };
  const kb = (n: number) => `${(n / 1024).toFixed(1)} KB`;
  const out: Record<string, string> = {};
  const shell = sizes(firstLoad(manifest, [entry]));
  out['app shell JS at first load (gzipped)'] = kb(shell.gz);
  for (const [label, route] of [
    ['board route', 'src/app/routes/board.tsx'],
    ['pocket route', 'src/app/routes/pocket.tsx'],
    ['recipe editor route', 'src/app/routes/recipe-edit.tsx'],
  ] as const) {
    if (!manifest[route]) {
      out[`${label}: not in the build`] = '-';
      continue;
    }
    const keys = firstLoad(manifest, [entry, route]);
    const { raw, gz } = sizes(keys);
    const goal = label === 'board route' ? ' (goal < 250 KB)' : '';
    out[`${label} JS at first load, gzipped${goal}`] = `${kb(gz)} (${kb(raw)} raw, ${keys.size} chunks)`;
    if (label !== 'recipe editor route') {
      const carriesEditor = [...keys].some((k) => /recipe-(edit|new)|recipe-form/.test(k + manifest[k]!.file));
      out[`${label} carries the recipe editor`] = carriesEditor ? 'yes' : 'no';
    }
  }
  return Promise.resolve(out);
}
