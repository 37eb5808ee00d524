// The service-worker step of the web build: after `expo export`, a small webpack build whose only output is
// sw.js. copy-webpack-plugin feeds the exported files into the compilation (unchanged: marked minimized so webpack
// does not minify the bundle again) so that workbox's InjectManifest can list them, with revisions, in the
// worker's precache manifest. Recipe and pitfalls: /work/shared/PLATFORM.md "Service worker".
import { existsSync } from 'node:fs';
import path from 'node:path';
import CopyPlugin from 'copy-webpack-plugin';
import webpack from 'webpack';
import { InjectManifest } from 'workbox-webpack-plugin';

const repoRoot = path.resolve(__dirname, '../../..');
const workerDir = path.join(repoRoot, 'sync', 'service-worker');

/** Files the worker precaches, relative to the export folder. Source maps and the worker itself are left out. */
const PRECACHE_EXCLUDE = [/\.map$/, /^sw\.js$/, /(^|\/)\.[^/]+$/, /^metadata\.json$/];

export interface ServiceWorkerBuild {
  swPath: string;
  precachedFiles: number;
  precachedBytes: number;
}

export async function buildServiceWorker(webDir: string): Promise<ServiceWorkerBuild> {
  const outDir = path.resolve(webDir);
  if (!existsSync(path.join(outDir, 'index.html'))) throw new Error(`no exported web app in ${outDir} (index.html missing)`);
  let precachedFiles = 0;
  let precachedBytes = 0;
  const compiler = webpack({
    mode: 'production',
    context: repoRoot,
    entry: {},
    output: { path: outDir, publicPath: '/' },
    resolve: { extensions: ['.ts', '.js'] },
    module: {
      rules: [{ test: /\.ts$/, loader: 'ts-loader', options: { transpileOnly: true, configFile: path.join(workerDir, 'tsconfig.worker.json') } }],
    },
    plugins: [
      new CopyPlugin({
        patterns: [{ from: '**/*', context: outDir, info: { minimized: true }, globOptions: { dot: false, ignore: ['**/sw.js', '**/*.map'] } }],
      }),
      new InjectManifest({
        swSrc: path.join(workerDir, 'sw.ts'),
        swDest: 'sw.js',
        exclude: PRECACHE_EXCLUDE,
        // The JS bundle is over the default 2 MiB limit; photos are never in the export, so 20 MiB is generous.
        maximumFileSizeToCacheInBytes: 20 * 1024 * 1024,
        // Expo's bundle names carry a content hash already: no cache-busting query needed for them.
        dontCacheBustURLsMatching: /-[0-9a-f]{16,}\.(js|css)$/,
        manifestTransforms: [
          async (entries) => {
            precachedFiles = entries.length;
            precachedBytes = entries.reduce((sum, e) => sum + e.size, 0);
            return { manifest: entries, warnings: [] };
          },
        ],
      }),
    ],
    performance: { hints: false },
    stats: 'errors-warnings',
  });
  const stats = await new Promise<webpack.Stats>((resolve, reject) =>
    compiler.run((err, s) => {
      compiler.close(() => undefined);
      if (err || !s) reject(err ?? new Error('webpack gave no result'));
      else resolve(s);
    }),
  );
  if (stats.hasErrors()) throw new Error(`service worker build failed:\n${stats.toString({ all: false, errors: true })}`);
  return { swPath: path.join(outDir, 'sw.js'), precachedFiles, precachedBytes };
}
