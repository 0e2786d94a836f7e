/** citation-js ships no TypeScript types: the little of its API that shared/entries/citations.ts uses. */
declare module '@citation-js/core' {
  export class Cite {
    constructor(data: unknown, options?: { forceType?: string });
    data: Record<string, unknown>[];
    format(format: string, options?: Record<string, unknown>): string | object;
  }
  export const plugins: {
    config: { get(name: string): unknown };
    input: { list(): string[] };
  };
  export const logger: unknown;
  export const util: unknown;
  export const version: string;
}
declare module '@citation-js/plugin-bibtex';
declare module '@citation-js/plugin-ris';
declare module '@citation-js/plugin-csl';
