export const WORKER_ENTRY_SOURCE: string;
export const WORKER_BUNDLE: string;
/** Bundles lib/workers/entry.ts into `outFile` (default .data/workers/entry.mjs); resolves to its path. */
export function buildWorkers(outFile?: string): Promise<string>;
