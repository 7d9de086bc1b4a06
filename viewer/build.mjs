// Builds the viewer into one self-contained HTML template: dist/viewer/viewer-template.html.
// Vite bundles viewer/src/main.ts (the page code and the starclock library it imports, with
// uPlot) into one IIFE script; this script inlines it and the styles (uPlot's and the page's)
// into viewer/index.html and writes a Content-Security-Policy that allows exactly that one
// script and that one style block (by SHA-256) and nothing from the network. `starclock view`
// fills the template's data placeholder (lib/io/viewerPayloadHtml.ts).
import { createHash } from 'node:crypto';
import { mkdir, readFile, rename, writeFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..');
const outDir = join(root, 'dist', 'viewer');
const require = createRequire(import.meta.url);

const result = await build({
  configFile: false,
  root: here,
  logLevel: 'warn',
  publicDir: false,
  build: {
    write: false,
    emptyOutDir: false,
    target: 'es2022',
    minify: true,
    sourcemap: false,
    lib: { entry: join(here, 'src', 'main.ts'), formats: ['iife'], name: 'starclockViewerBundle', fileName: () => 'viewer.js' },
  },
});
const outputs = (Array.isArray(result) ? result : [result]).flatMap((r) => r.output);
const chunks = outputs.filter((o) => o.type === 'chunk');
if (chunks.length !== 1) throw new Error(`viewer build: expected one script, got ${chunks.length}`);
// "</script" or "<!--" inside the script would end the element early: escape the "<"
const script = chunks[0].code.replace(/<(?=\/script|!--)/gi, '\\x3C');
if (/<\/script/i.test(script)) throw new Error('viewer build: the script still holds </script');
const uplotCss = await readFile(require.resolve('uplot/dist/uPlot.min.css'), 'utf8');
const pageCss = await readFile(join(here, 'style.css'), 'utf8');
const style = `${uplotCss}\n${pageCss}`;
if (/<\/style/i.test(style)) throw new Error('viewer build: the styles hold </style');
const sha = (text) => `'sha256-${createHash('sha256').update(text, 'utf8').digest('base64')}'`;
const csp = [
  "default-src 'none'",
  `script-src ${sha(script)}`,
  `style-src ${sha(style)}`,
  'img-src data: blob:',
  "base-uri 'none'",
  "form-action 'none'",
].join('; ');
let html = await readFile(join(here, 'index.html'), 'utf8');
const fill = (marker, text) => {
  const parts = html.split(marker);
  if (parts.length !== 2) throw new Error(`viewer build: ${marker} appears ${parts.length - 1} times in viewer/index.html`);
  html = parts[0] + text + parts[1];
};
fill('__STARCLOCK_CSP__', csp);
fill('__STARCLOCK_STYLE__', style);
fill('__STARCLOCK_SCRIPT__', script);
if (html.split('"__STARCLOCK_VIEWER_DATA__"').length !== 2) throw new Error('viewer build: the data placeholder must appear exactly once');
await mkdir(outDir, { recursive: true });
const target = join(outDir, 'viewer-template.html');
const temporary = `${target}.${process.pid}.tmp`;
await writeFile(temporary, html);
await rename(temporary, target);
process.stderr.write(`viewer: wrote ${target} (${(html.length / 1024).toFixed(0)} KiB)\n`);
