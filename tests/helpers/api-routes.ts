import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';

/** One route file of the app: its URL path as the folders spell it (`/api/v1/systems/[id]`) and its source text. */
export interface ApiRouteFile {
  route: string;
  source: string;
}

/** Every `route.ts` under app/api, found by walking the folder (for tests that check each route the app serves). */
export function apiRouteFiles(): ApiRouteFile[] {
  const root = path.resolve(__dirname, '../../app/api');
  const found: ApiRouteFile[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir)) {
      const full = path.join(dir, entry);
      if (statSync(full).isDirectory()) walk(full);
      else if (entry === 'route.ts') found.push({ route: `/api/${path.relative(root, dir).split(path.sep).join('/')}`, source: readFileSync(full, 'utf8') });
    }
  };
  walk(root);
  return found;
}
