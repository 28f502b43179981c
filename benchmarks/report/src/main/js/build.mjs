// Bundles view.js with three.js (from node_modules, installed by `npm ci` from package-lock.json)
// into one minified script for the HTML report. Usage: node build.mjs OUTFILE
import * as esbuild from 'esbuild';

const out = process.argv[2];
if (!out) {
  console.error('usage: node build.mjs OUTFILE');
  process.exit(2);
}
esbuild.buildSync({
  entryPoints: [new URL('./view.js', import.meta.url).pathname],
  bundle: true,
  minify: true,
  format: 'iife',
  target: 'es2020',
  legalComments: 'eof',
  outfile: out,
  logLevel: 'warning',
});
