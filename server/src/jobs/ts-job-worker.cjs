'use strict';
// Worker bootstrap used only when the server runs from its TypeScript sources (under vitest, which
// transforms the main thread but not worker threads). It compiles each .ts file as it is required,
// with TypeScript's own transpiler (already a dependency; no loader package), as CommonJS that keeps
// `import()` for the ESM-only readers, as the built server does (tsconfig `module: node20`).
// `@upwell/common` resolves to the engine and CF-time sources, all that jobs use of it.
const { workerData } = require('node:worker_threads');
const Module = require('node:module');
const { readFileSync } = require('node:fs');
const { join } = require('node:path');
const ts = require('typescript');

const compilerOptions = {
  module: ts.ModuleKind.Node16,
  target: ts.ScriptTarget.ES2022,
  esModuleInterop: true,
  experimentalDecorators: true,
  inlineSourceMap: true,
};
require.extensions['.ts'] = (module, filename) => {
  const { outputText } = ts.transpileModule(readFileSync(filename, 'utf8'), { compilerOptions, fileName: filename.replace(/\.ts$/, '.cts') });
  module._compile(outputText, filename);
};

const commonKey = join(workerData.commonSrc, '__job-worker-common__.ts');
const common = new Module(commonKey);
common.filename = commonKey;
common.loaded = true;
common.exports = { ...require(join(workerData.commonSrc, 'engine.ts')), ...require(join(workerData.commonSrc, 'time', 'index.ts')) };
Module._cache[commonKey] = common;
const resolve = Module._resolveFilename;
Module._resolveFilename = function (request, ...rest) {
  return request === '@upwell/common' ? commonKey : resolve.call(this, request, ...rest);
};

require(workerData.entry);
