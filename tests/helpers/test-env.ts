// Where the test processes find each other: set by global-setup, read by tests through inject().
declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    mailDir: string;
    printDir: string;
    printerUrl: string;
  }
}

export {};
