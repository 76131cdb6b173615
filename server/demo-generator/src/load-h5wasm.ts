// h5wasm is ESM-only; compiled as CommonJS with `module: node20`, a dynamic import() stays an import() and loads it.
type H5wasm = typeof import('h5wasm/node');

let h5wasmModule: Promise<H5wasm> | undefined;

/** h5wasm's Node build, initialised once (the generator's only use of it: writing the NetCDF-4 demo field). */
export function loadH5wasm(): Promise<H5wasm> {
  h5wasmModule ??= import('h5wasm/node').then(async (m) => {
    await m.ready;
    return m;
  });
  return h5wasmModule;
}
