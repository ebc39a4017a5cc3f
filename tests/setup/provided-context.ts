// What the global setups hand to test files through vitest's inject().
declare module 'vitest' {
  export interface ProvidedContext {
    /** api project: the throwaway database, already migrated. */
    databaseUrl: string;
    /** api project: local object storage; clients need forcePathStyle and WHEN_REQUIRED checksums. */
    s3Endpoint: string;
    s3Bucket: string;
    /** api project: smtp://127.0.0.1:<port> of the mail catcher. */
    smtpUrl: string;
    /** api and e2e projects: the mail catcher's web API (GET /api/email). */
    inboxUrl: string;
    /** e2e project: the running app, e.g. http://127.0.0.1:41234. */
    appUrl: string;
  }
}

export {};
