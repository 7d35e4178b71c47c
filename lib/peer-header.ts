// The request header the app's own server (scripts/serve.ts) sets to the socket's address, overwriting
// anything a client sent under that name.
export const PEER_HEADER = 'x-tallyforge-peer';
