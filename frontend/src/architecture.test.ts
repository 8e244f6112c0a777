// @vitest-environment node
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

/**
 * Import boundaries: features never import each other or the app; shared layers (api, lib,
 * components, config, theme) never import features or the app; the HTTP client imports no UI.
 * Pages in app/routes are the only place features meet.
 */
const srcDir = dirname(fileURLToPath(import.meta.url));

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return /\.(ts|tsx)$/.test(name) && !/\.d\.ts$/.test(name) ? [path] : [];
  });
}

function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const specifiers: string[] = [];
  for (const match of text.matchAll(/(?:import|export)\s[^'"]*?from\s+['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g)) {
    specifiers.push((match[1] ?? match[2])!);
  }
  return specifiers;
}

/** 'features/houses', 'app', 'lib' … for a file or an import that resolves inside src/. */
function layerOf(path: string): string | null {
  const inside = relative(srcDir, path);
  if (inside.startsWith('..')) return null;
  const parts = inside.split(sep);
  return parts[0] === 'features' ? `features/${parts[1]}` : parts[0]!;
}

const files = sourceFiles(srcDir).filter((file) => !file.endsWith('.test.ts') && !file.endsWith('.test.tsx'));

describe('import boundaries', () => {
  it('finds the source files', () => {
    expect(files.length).toBeGreaterThan(20);
  });

  it('features import no other feature and not the app', () => {
    const violations: string[] = [];
    for (const file of files) {
      const layer = layerOf(file);
      if (!layer?.startsWith('features/')) continue;
      for (const specifier of importsOf(file)) {
        if (!specifier.startsWith('.')) continue;
        const target = layerOf(resolve(dirname(file), specifier));
        if (target !== layer && (target?.startsWith('features/') || target === 'app')) {
          violations.push(`${relative(srcDir, file)} → ${specifier}`);
        }
      }
    }
    expect(violations).toEqual([]);
  });

  it('shared layers import no feature and not the app', () => {
    const shared = new Set(['api', 'lib', 'components', 'config', 'theme']);
    const violations: string[] = [];
    for (const file of files) {
      if (!shared.has(layerOf(file) ?? '')) continue;
      for (const specifier of importsOf(file)) {
        if (!specifier.startsWith('.')) continue;
        const target = layerOf(resolve(dirname(file), specifier));
        if (target?.startsWith('features/') || target === 'app') {
          violations.push(`${relative(srcDir, file)} → ${specifier}`);
        }
      }
    }
    expect(violations).toEqual([]);
  });

  it('the HTTP client layer imports no UI library', () => {
    const violations = files
      .filter((file) => layerOf(file) === 'api')
      .flatMap((file) =>
        importsOf(file)
          .filter((specifier) => /^(react|react-dom|@mui\/|@emotion\/|react-router)/.test(specifier))
          .map((specifier) => `${relative(srcDir, file)} → ${specifier}`),
      );
    expect(violations).toEqual([]);
  });
});
