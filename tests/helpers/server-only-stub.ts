// Stands in for the `server-only` marker outside Next's react-server build (vitest, scripts).
export {};
