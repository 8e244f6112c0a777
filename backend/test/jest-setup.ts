// body-parser decodes bodies through iconv-lite, which loads its encoding tables lazily on the
// first request. Under jest's per-file module registry that lazy load can fail intermittently
// ("unsupported charset UTF-8"); loading the tables up front avoids it.
// eslint-disable-next-line @typescript-eslint/no-require-imports
require('iconv-lite').getCodec('utf-8');
