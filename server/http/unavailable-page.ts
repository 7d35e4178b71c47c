// The page the app's own server answers in place of any page while the database cannot be reached
// (scripts/serve.ts): self-contained, since nothing behind it can render, and it looks again by itself.
export const UNAVAILABLE_RETRY_S = 10;

export const UNAVAILABLE_CSP = "default-src 'none'; style-src 'unsafe-inline'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'";

export function unavailablePage(): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="refresh" content="${UNAVAILABLE_RETRY_S}">
<title>Database unavailable · Tallyforge</title>
<style>
  body { margin: 0; min-height: 100vh; display: grid; place-items: center; background: #f5f2eb; color: #182229; font: 16px/1.5 system-ui, sans-serif; }
  main { max-width: 32rem; margin: 1.5rem; padding: 1.5rem; background: #fffdf8; border: 1px solid #ddd6c8; border-top: 4px solid #b86e0c; border-radius: 0.5rem; }
  h1 { margin: 0 0 0.5rem; font-size: 1.25rem; }
  p { margin: 0.5rem 0 0; color: #3b4852; }
  .brand { font-weight: 700; color: #1f5a70; letter-spacing: 0.02em; }
</style>
</head>
<body>
<main data-testid="database-unavailable">
<p class="brand">Tallyforge</p>
<h1>The database cannot be reached</h1>
<p>Nothing can be shown or saved until it is back. Counts already captured are kept; a bench holding a capture it could not send keeps it and sends it once the database answers.</p>
<p>This page looks again every ${UNAVAILABLE_RETRY_S} seconds. If it stays, tell your administrator.</p>
</main>
</body>
</html>
`;
}
