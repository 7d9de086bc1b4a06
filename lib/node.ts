// Node-only entry of the public API: everything of lib/index.ts plus what reads the disk.
export * from './index.js';
export { loadBuiltinGrid } from './io/loadBuiltinGrid.js';
export { builtinGridPath } from './io/builtinGridPath.js';
