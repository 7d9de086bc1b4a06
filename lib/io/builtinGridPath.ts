/**
 * Where `npm run build` writes the built-in grid cache: `dist/grid/builtin-grid.bin` of the
 * package, whether this module runs compiled (dist/lib/io) or from source (lib/io, tests).
 */
export function builtinGridPath(): URL {
  const up = new URL('../../', import.meta.url);
  const inDist = up.pathname.replace(/\/$/, '').endsWith('/dist');
  return new URL(inDist ? 'grid/builtin-grid.bin' : 'dist/grid/builtin-grid.bin', up);
}
