/** What the global setup started, handed to test files through vitest's provide/inject. */
export interface TestStack {
  adminDatabaseUrl: string;
  templateDatabase: string;
  env: Record<string, string>;
  mailWebUrl: string;
  /** Set for the browser project only: a running app with a seeded database. */
  appUrl?: string;
  artifactsDir: string;
}

declare module 'vitest' {
  export interface ProvidedContext {
    stack: TestStack;
  }
}
