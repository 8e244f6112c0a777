/* eslint-disable @typescript-eslint/no-require-imports */
// The worker thread's entry when the app runs from its TypeScript sources (the e2e specs run it
// through ts-jest, which does not reach into worker threads). It compiles the worker and what
// it imports on the fly with TypeScript's own transpiler, and maps @thermbay/engine to the
// engine's sources as jest's moduleNameMapper does. The built app never loads this file: it
// runs dist/temperature-logs/csv/temperature-log-csv.worker.js.
const fs = require('node:fs');
const Module = require('node:module');
const path = require('node:path');
const ts = require('typescript');

const engineSource = path.resolve(__dirname, '../../../engine/src');
const resolveFilename = Module._resolveFilename;
Module._resolveFilename = function (request, ...rest) {
  const mapped =
    request === '@thermbay/engine' || request.startsWith('@thermbay/engine/')
      ? path.join(engineSource, request.slice('@thermbay/engine'.length))
      : request;
  return resolveFilename.call(this, mapped, ...rest);
};

require.extensions['.ts'] = (module, filename) => {
  const { outputText } = ts.transpileModule(fs.readFileSync(filename, 'utf8'), {
    fileName: filename,
    compilerOptions: {
      module: ts.ModuleKind.CommonJS,
      target: ts.ScriptTarget.ES2022,
      esModuleInterop: true,
      isolatedModules: true,
    },
  });
  module._compile(outputText, filename);
};

module.exports = require('./temperature-log-csv.worker.ts');
