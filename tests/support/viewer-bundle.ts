import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

// What a phone downloads before the viewer's first screen can paint, read from the Vite
// manifest of the viewer build (`build.manifest` in apps/viewer/vite.config.ts): the entry chunk
// with every chunk it imports statically, plus the route module with its static imports.
// Dynamic imports load later and are not counted.

/** First-screen JavaScript budget of the viewer, gzip (issue #11). */
export const FIRST_SCREEN_JS_BUDGET_BYTES = 150 * 1024;

export const viewerDist = path.resolve(
  path.dirname(fileURLToPath(import.meta.url)),
  '../../apps/viewer/dist',
);

/** Each viewer route a phone may land on, with the module that `routes.tsx` loads for it. */
export const viewerLandingRoutes = [
  { name: 'welcome', module: 'src/app/routes/welcome.tsx' },
  { name: 'studio page', module: 'src/app/routes/studio-page.tsx' },
  { name: 'dye-along page', module: 'src/app/routes/studio-dye-along.tsx' },
  { name: 'studio live', module: 'src/app/routes/studio-live.tsx' },
  { name: 'live follow-along', module: 'src/app/routes/live-follow.tsx' },
] as const;

interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
}

export type ViewerManifest = Record<string, ManifestChunk>;

export function readViewerManifest(dist = viewerDist): ViewerManifest {
  const file = path.join(dist, '.vite', 'manifest.json');
  if (!existsSync(file)) {
    throw new Error(`${file} is missing: build the viewer first (pnpm build).`);
  }
  return JSON.parse(readFileSync(file, 'utf8')) as ViewerManifest;
}

/** Manifest keys of a chunk and everything it imports statically, depth first. */
function staticClosure(manifest: ViewerManifest, key: string, seen = new Set<string>()) {
  if (seen.has(key)) return seen;
  const chunk = manifest[key];
  if (!chunk) throw new Error(`The viewer manifest has no chunk "${key}".`);
  seen.add(key);
  for (const next of chunk.imports ?? []) staticClosure(manifest, next, seen);
  return seen;
}

export interface RouteJs {
  name: string;
  files: string[];
  gzipBytes: number;
}

/** Gzip size of a built file (zlib's default level, as a server compressing on the fly). */
function gzipBytes(dist: string, file: string): number {
  return gzipSync(readFileSync(path.join(dist, file))).length;
}

/** JavaScript a phone loads to show one route: the entry's and the route's static imports. */
export function routeJs(
  manifest: ViewerManifest,
  route: { name: string; module: string },
  dist = viewerDist,
): RouteJs {
  const entry = Object.keys(manifest).find((key) => manifest[key]!.isEntry);
  if (!entry) throw new Error('The viewer manifest has no entry chunk.');
  const keys = staticClosure(manifest, route.module, staticClosure(manifest, entry));
  const files = [...keys].map((key) => manifest[key]!.file).filter((f) => f.endsWith('.js'));
  return {
    name: route.name,
    files,
    gzipBytes: files.reduce((sum, f) => sum + gzipBytes(dist, f), 0),
  };
}

export const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;
