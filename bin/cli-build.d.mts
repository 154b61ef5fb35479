// Types for bin/cli-build.mjs (imported by TypeScript from tests/setup).
export declare const repoRoot: string;
export declare const cliBundle: string;
export declare const cliEntry: string;
export declare function cliBuildIsStale(): boolean;
export declare function buildCli(options?: { onlyIfStale?: boolean }): Promise<boolean>;
