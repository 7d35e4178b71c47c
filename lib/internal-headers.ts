// Request headers the app sets for itself, overwriting anything a client sent under those names.
/** The socket's address, set by the app's own server (scripts/serve.ts). */
export const PEER_HEADER = 'x-tallyforge-peer';
/** The page asked for, set by proxy.ts, so the shell can check its permission before it starts sending. */
export const PAGE_PATH_HEADER = 'x-tallyforge-page';
