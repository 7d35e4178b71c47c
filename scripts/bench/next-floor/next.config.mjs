// A minimal Next.js app of the load bench's own (scripts/bench/next-floor.ts builds and starts it):
// the same Next version as the app, one route handler, nothing else.
export default { poweredByHeader: false };
