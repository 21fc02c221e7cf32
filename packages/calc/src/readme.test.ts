import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { METHODS, screen } from './index';

/**
 * The package README shows one example per method as a ```json block. Every
 * such block must screen, and each method must have one that is identical to
 * one of its `examples`, so the README cannot drift from the engine. (Other
 * JSON-like text in the README uses ```jsonc and is not screened.)
 */
const README = readFileSync(fileURLToPath(new URL('../README.md', import.meta.url)), 'utf8');
const blocks = [...README.matchAll(/```json\n([\s\S]*?)```/g)].map((m) => m[1]!);

describe('README examples', () => {
  it('has json blocks', () => {
    expect(blocks.length).toBeGreaterThan(0);
  });

  it.each(blocks.map((b, i) => [i, b] as const))('block %i screens', (_i, block) => {
    const parsed = JSON.parse(block) as unknown;
    for (const input of Array.isArray(parsed) ? parsed : [parsed])
      expect(() => screen(input)).not.toThrow();
  });

  it('shows the example of every method, as in its examples', () => {
    const parsed = blocks.map((b) => JSON.parse(b) as unknown);
    const lacking = METHODS.filter(
      (m) =>
        !parsed.some((block) =>
          m.examples.some((e) => JSON.stringify(e.input) === JSON.stringify(block)),
        ),
    ).map((m) => m.kind);
    // A kind listed here needs its example (examples[0]) in README.md under "## Methods".
    expect(lacking, `kinds without their example in README.md: ${lacking.join(', ')}`).toEqual([]);
  });
});
