/** Types of scripts/openapi-subset.mjs for the test that keeps its output current. */
export function subset(
  full: unknown,
  list: { operations: string[]; examples: string[] },
): Record<string, unknown>;
