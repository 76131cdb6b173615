'use strict';
// Worker bootstrap used only when the server runs from its TypeScript sources (under vitest, which
// transforms the main thread but not worker threads). It compiles each .ts file as it is required,
// with TypeScript's own transpiler (already a dependency; no loader package), as CommonJS that keeps
// `import()` for the ESM-only readers, as the built server does (tsconfig `module: node20`).
// `@upwell/common` resolves to the engine and CF-time sources, all that jobs use of it.
const { workerData } = require('node:worker_threads');
const Module = require('node:module');
const { createHash } = require('node:crypto');
const { mkdirSync, readFileSync, renameSync, writeFileSync } = require('node:fs');
const { tmpdir } = require('node:os');
const { join } = require('node:path');

// Compiled output is kept by content hash, so later workers (and test runs) skip loading TypeScript.
const cacheDir = join(tmpdir(), 'upwell-job-worker-ts-cache');
mkdirSync(cacheDir, { recursive: true });
let ts = null;

function compile(source, filename) {
  ts ??= require('typescript');
  const compilerOptions = { module: ts.ModuleKind.Node16, target: ts.ScriptTarget.ES2022, esModuleInterop: true, experimentalDecorators: true, inlineSourceMap: true };
  return ts.transpileModule(source, { compilerOptions, fileName: filename.replace(/\.ts$/, '.cts') }).outputText;
}

require.extensions['.ts'] = (module, filename) => {
  const source = readFileSync(filename, 'utf8');
  const cached = join(cacheDir, `${createHash('sha256').update(filename).update('\0').update(source).digest('hex')}.js`);
  let output;
  try {
    output = readFileSync(cached, 'utf8');
  } catch {
    output = compile(source, filename);
    const draft = `${cached}.${process.pid}.${Math.random().toString(36).slice(2)}`;
    writeFileSync(draft, output);
    renameSync(draft, cached);
  }
  module._compile(output, filename);
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
