// netcdfjs 4 and h5wasm are ESM-only. The server compiles to CommonJS with `module: node20`,
// under which a dynamic import() stays an import() and can load them (see shared/toolchain.md).

type H5wasm = typeof import('h5wasm/node');
type Netcdfjs = typeof import('netcdfjs');

let h5wasmModule: Promise<H5wasm> | undefined;
let netcdfjsModule: Promise<Netcdfjs> | undefined;

/** h5wasm's Node build (host filesystem through Emscripten NODERAWFS), initialised once. */
export function loadH5wasm(): Promise<H5wasm> {
  h5wasmModule ??= import('h5wasm/node').then(async (m) => {
    await m.ready;
    return m;
  });
  return h5wasmModule;
}

/** netcdfjs, loaded once. */
export function loadNetcdfjs(): Promise<Netcdfjs> {
  netcdfjsModule ??= import('netcdfjs');
  return netcdfjsModule;
}
