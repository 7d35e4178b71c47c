// Where the test processes find each other: set by global-setup, read by tests through inject().
declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    mailDir: string;
    printDir: string;
    printerUrl: string;
    // What the first app instance was started with, so a test can start another just like it.
    appEnv: Record<string, string>;
  }
}

export {};
