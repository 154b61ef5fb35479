// Types for find-chromium.mjs (imported by playwright.config.ts).
export declare const installHint: string;
export declare function findChromium(): string | undefined;
export declare function requireChromium(): string;
