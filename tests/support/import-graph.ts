/**
 * The runtime import graph of the project's own TypeScript, read from the source
 * (import, export … from, import()); type-only imports are left out, as the
 * compiler erases them. Packages are recorded by name and not followed.
 */
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';

const EXTENSIONS = ['.ts', '.tsx', '/index.ts', '/index.tsx'];

function resolveSpecifier(root: string, from: string, spec: string): string | null {
  let base: string;
  if (spec.startsWith('@/')) base = path.join(root, spec.slice(2));
  else if (spec.startsWith('.')) base = path.resolve(path.dirname(from), spec);
  else return null;
  if (/\.(ts|tsx)$/.test(base) && existsSync(base)) return base;
  for (const e of EXTENSIONS) if (existsSync(base + e)) return base + e;
  return base; // a stylesheet or another non-TypeScript file
}

/**
 * The module specifiers a file imports; with `types`, type-only imports too; without
 * `dynamic`, not import() (what a bundler leaves to a chunk fetched later).
 */
export function importsOf(file: string, { types = false, dynamic = true } = {}): string[] {
  const src = ts.createSourceFile(file, readFileSync(file, 'utf8'), ts.ScriptTarget.Latest, true);
  const out: string[] = [];
  const visit = (n: ts.Node) => {
    if (ts.isImportDeclaration(n)) {
      const c = n.importClause;
      const named = c?.namedBindings && ts.isNamedImports(c.namedBindings) ? c.namedBindings.elements : undefined;
      const typeOnly =
        !!c && (c.isTypeOnly || (!c.name && !!named && named.length > 0 && named.every((e) => e.isTypeOnly)));
      if (types || !typeOnly) out.push((n.moduleSpecifier as ts.StringLiteral).text);
    } else if (ts.isExportDeclaration(n) && n.moduleSpecifier) {
      const named = n.exportClause && ts.isNamedExports(n.exportClause) ? n.exportClause.elements : undefined;
      const typeOnly = n.isTypeOnly || (!!named && named.length > 0 && named.every((e) => e.isTypeOnly));
      if (types || !typeOnly) out.push((n.moduleSpecifier as ts.StringLiteral).text);
    } else if (dynamic && ts.isCallExpression(n) && n.expression.kind === ts.SyntaxKind.ImportKeyword) {
      const arg = n.arguments[0];
      if (arg && ts.isStringLiteral(arg)) out.push(arg.text);
    }
    ts.forEachChild(n, visit);
  };
  visit(src);
  return out;
}

const packageName = (spec: string) =>
  spec.startsWith('@') ? spec.split('/').slice(0, 2).join('/') : spec.split('/')[0];

const USE_CLIENT = /^\s*(?:(?:\/\/[^\n]*\n|\/\*[\s\S]*?\*\/)\s*)*['"]use client['"]/;

/**
 * Everything a module pulls in at run time: project files (relative to `root`), packages, and
 * the client modules among the files. `dynamic: false` leaves out what import() fetches later.
 */
export function importClosure(root: string, entry: string, { dynamic = true } = {}) {
  const files = new Set<string>();
  const packages = new Set<string>();
  const stack = [path.resolve(root, entry)];
  while (stack.length) {
    const f = stack.pop()!;
    if (files.has(f)) continue;
    files.add(f);
    if (!/\.(ts|tsx)$/.test(f)) continue;
    for (const spec of importsOf(f, { dynamic })) {
      const r = resolveSpecifier(root, f, spec);
      if (r) stack.push(r);
      else packages.add(packageName(spec));
    }
  }
  const rel = [...files].map((f) => path.relative(root, f)).sort();
  const client = rel.filter((f) => /\.(ts|tsx)$/.test(f) && USE_CLIENT.test(readFileSync(path.join(root, f), 'utf8')));
  return { files: rel, packages: [...packages].sort(), client };
}

/** The TypeScript files under a folder, relative to `root`. */
export function sourceFiles(root: string, dir: string): string[] {
  const out: string[] = [];
  const walk = (d: string) => {
    for (const name of readdirSync(path.join(root, d))) {
      const rel = path.join(d, name);
      if (statSync(path.join(root, rel)).isDirectory()) walk(rel);
      else if (/\.(ts|tsx)$/.test(name)) out.push(rel);
    }
  };
  walk(dir);
  return out.sort();
}

/** Where a specifier in `file` points, relative to `root` (packages as they are). */
export function target(root: string, file: string, spec: string): string {
  const r = resolveSpecifier(root, path.join(root, file), spec);
  return r ? path.relative(root, r) : spec;
}
