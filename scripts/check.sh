#!/usr/bin/env bash
# npm run check: what must hold before any test runs — ESLint (TypeScript, React hooks, Next, and the
# folder table of DEVELOPERS.md as import boundaries), Prettier's format, and the TypeScript types.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
BIN="$ROOT/node_modules/.bin"
"$BIN/eslint" --max-warnings 0 . || { log "lint failed (npx eslint . shows it; --fix mends some)"; exit 1; }
"$BIN/prettier" --check --log-level warn . || { log "format differs: npm run format writes it"; exit 1; }
"$BIN/tsc" --noEmit -p . || { log "type check failed"; exit 1; }
