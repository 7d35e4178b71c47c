// Every route handler file under app/api, with the URL path it serves: the role matrix and the
// fuzzer both work from this list, so a new route is seen by both.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';

const appDir = path.resolve(__dirname, '../../app');

function routeFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return routeFiles(full);
    return name === 'route.ts' ? [full] : [];
  });
}

export function apiRouteFiles(): { route: string; source: string }[] {
  return routeFiles(path.join(appDir, 'api')).map((file) => ({
    route:
      '/' +
      path
        .relative(appDir, path.dirname(file))
        .split(path.sep)
        .filter((s) => !s.startsWith('('))
        .join('/'),
    source: readFileSync(file, 'utf8'),
  }));
}
