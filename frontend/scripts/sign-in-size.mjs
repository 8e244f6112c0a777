// Prints the JavaScript a browser loads for the sign-in page, from the production build in dist/:
// the entry chunk named in index.html, the sign-in route's chunk, and every chunk they import
// statically (dynamic imports are left out: they load later). Sizes are gzip, level 9.
// Run after `npm run build:app`: node scripts/sign-in-size.mjs
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

const dist = new URL('../dist/', import.meta.url).pathname;
const assets = join(dist, 'assets');
const html = readFileSync(join(dist, 'index.html'), 'utf8');
const entries = [...html.matchAll(/(?:src|href)="\/assets\/([^"]+\.js)"/g)].map((match) => match[1]);
const signIn = readdirSync(assets).filter((name) => /^login-page-.*\.js$/.test(name));
if (entries.length === 0 || signIn.length !== 1) {
  console.error('no build found: run `npm run build:app -w @thermbay/frontend` first');
  process.exit(1);
}

const seen = new Set();
const queue = [...entries, ...signIn];
while (queue.length > 0) {
  const name = queue.shift();
  if (seen.has(name)) continue;
  seen.add(name);
  const code = readFileSync(join(assets, name), 'utf8');
  // static imports only: `import … from "./x.js"` and `import "./x.js"`, not `import("./x.js")`
  for (const match of code.matchAll(
    /(?:^|[;\s}])(?:import|export)\s*(?:[^"'();]*?from\s*)?["']\.\/([^"']+\.js)["']/g,
  )) {
    queue.push(match[1]);
  }
}

let total = 0;
const rows = [...seen].map((name) => {
  const gzip = gzipSync(readFileSync(join(assets, name)), { level: 9 }).length;
  total += gzip;
  return { name, gzip };
});
rows.sort((a, b) => b.gzip - a.gzip);
for (const row of rows) console.log(`${(row.gzip / 1024).toFixed(1).padStart(8)} kB  ${row.name}`);
console.log(`${(total / 1024).toFixed(1).padStart(8)} kB  sign-in page initial JS, gzip (aim ≤ 250 kB)`);
