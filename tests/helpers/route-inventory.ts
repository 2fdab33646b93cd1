import fs from 'node:fs';
import path from 'node:path';

export type RouteKey = `${'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE'} /api${string}`;

// Reads the routes from the source, so a route added anywhere shows up here without anyone listing it.
export function routeInventory(root = path.resolve('server')): RouteKey[] {
  const app = fs.readFileSync(path.join(root, 'app.ts'), 'utf8');
  const imports = new Map<string, string>();
  for (const m of app.matchAll(/import \{([^}]+)\} from '\.\/([^']+)'/g)) for (const name of m[1].split(',').map((s) => s.trim())) imports.set(name, m[2]);
  const keys: RouteKey[] = [];
  for (const m of app.matchAll(/api\.(get|post|put|patch|delete)\('([^']+)'/g)) keys.push(`${m[1].toUpperCase()} /api${m[2]}` as RouteKey);
  for (const m of app.matchAll(/api\.use\('([^']+)', (\w+)\(/g)) {
    const [prefix, fn] = [m[1] === '/' ? '' : m[1], m[2]];
    const file = fs.readFileSync(path.join(root, `${imports.get(fn)}.ts`), 'utf8');
    const body = file.split(/export function /).find((chunk) => chunk.startsWith(`${fn}(`));
    if (!body) throw new Error(`route function ${fn} not found in ${imports.get(fn)}`);
    for (const r of body.matchAll(/\br\.(get|post|put|patch|delete)\('([^']+)'/g)) keys.push(`${r[1].toUpperCase()} /api${prefix}${r[2] === '/' ? '' : r[2]}` as RouteKey);
  }
  return keys;
}
