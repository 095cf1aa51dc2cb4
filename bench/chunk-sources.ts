/**
 * What each first-load chunk of a page holds, by source file (bytes of minified code,
 * before gzip). Needs a build with source maps:
 *   ANALYZE=1 npx next build, serve it, then
 *   npx tsx bench/chunk-sources.ts http://127.0.0.1:3000/guides/the-delivery-line [top]
 */
import { readFileSync, existsSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { SourceMapConsumer } from 'source-map-js';

const url = process.argv[2] ?? 'http://127.0.0.1:3000/guides/the-delivery-line';
const top = Number(process.argv[3] ?? 40);

function group(source: string): string {
  const s = source.replace(/^turbopack:\/\/\/\[project\]\//, '');
  const nm = s.match(/node_modules\/((?:@[^/]+\/)?[^/]+)/);
  if (nm) return `npm:${nm[1]}`;
  return s;
}

async function main() {
  const html = await (await fetch(url)).text();
  const names = new Set<string>();
  // nomodule scripts are polyfills that current browsers never fetch
  for (const m of html.matchAll(/<(?:script|link)([^>]*?)(?:src|href)="(\/_next\/static\/chunks\/[^"]+\.js)"([^>]*)>/g))
    if (!/nomodule/i.test(m[1]! + m[3]!)) names.add(m[2]!);
  const bySource = new Map<string, number>();
  const byGroup = new Map<string, number>();
  const textOf = new Map<string, string[]>();
  for (const name of names) {
    const file = path.join('.next/static/chunks', path.basename(name));
    const code = readFileSync(file, 'utf8');
    const ref = code.match(/sourceMappingURL=(\S+)\s*$/)?.[1];
    const mapFile = ref ? path.join('.next/static/chunks', ref) : '';
    if (!ref || !existsSync(mapFile)) {
      byGroup.set(`(no map) ${name}`, code.length);
      continue;
    }
    const consumer = new SourceMapConsumer(JSON.parse(readFileSync(mapFile, 'utf8')));
    const lines = code.split('\n');
    let prev: { line: number; col: number; source: string | null } | null = null;
    const add = (src: string | null, n: number) => {
      const key = src ?? '(unmapped)';
      bySource.set(key, (bySource.get(key) ?? 0) + n);
      const g = src ? group(src) : '(unmapped)';
      byGroup.set(g, (byGroup.get(g) ?? 0) + n);
    };
    const close = (line: number, col: number) => {
      if (!prev) return;
      const g = prev.source ? group(prev.source) : '(unmapped)';
      const slice =
        line === prev.line
          ? (lines[line - 1] ?? '').slice(prev.col, col)
          : [
              (lines[prev.line - 1] ?? '').slice(prev.col),
              ...lines.slice(prev.line, line - 1),
              (lines[line - 1] ?? '').slice(0, col),
            ].join('\n');
      textOf.set(g, [...(textOf.get(g) ?? []), slice]);
      if (line === prev.line) add(prev.source, col - prev.col);
      else {
        add(prev.source, (lines[prev.line - 1]?.length ?? 0) - prev.col);
        for (let l = prev.line + 1; l < line; l++) add(prev.source, lines[l - 1]?.length ?? 0);
        add(prev.source, col);
      }
    };
    consumer.eachMapping((m) => {
      close(m.generatedLine, m.generatedColumn);
      prev = { line: m.generatedLine, col: m.generatedColumn, source: m.source };
    });
    close(lines.length, lines[lines.length - 1]?.length ?? 0);
  }
  const print = (title: string, map: Map<string, number>) => {
    console.log(`\n${title}`);
    for (const [k, v] of [...map].sort((a, b) => b[1] - a[1]).slice(0, top))
      console.log(`${(v / 1024).toFixed(1).padStart(7)} kB  ${k}`);
  };
  const gz = new Map([...textOf].map(([g, parts]) => [g, gzipSync(parts.join(''), { level: 9 }).length]));
  print('by package or project folder (each gzipped on its own: an estimate)', gz);
  print('by package or project folder', byGroup);
  print('by file', bySource);
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
