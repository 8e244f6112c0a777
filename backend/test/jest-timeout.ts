// Specs are judged by what they assert, not by how fast a cold machine runs them: booting the
// whole app on a cold cache (ts-jest compiling it first) can take several seconds.
jest.setTimeout(60_000);
