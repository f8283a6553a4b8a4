// The page the service worker answers with when a field page was never opened on this tablet
// and there is no signal. Self-contained (inline styles, no scripts): nothing else may load.
// Colours are the tailwind.config.ts values: slate text, brand-700 link, brand-50 panel.

export const OFFLINE_PAGE_HTML =
  `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>No signal · Setline</title>
</head>
<body style="margin:0;font-family:system-ui,sans-serif;background:#f1f5f9;color:#0f172a">
<main style="max-width:36rem;margin:3rem auto;padding:1.5rem;background:#effaf8;border:2px solid #115e59;border-radius:0.75rem">
<h1 style="font-size:1.75rem;margin:0 0 0.75rem">No signal</h1>
<p style="font-size:1.125rem;line-height:1.5">This page has not been opened on this tablet yet, so there is no copy of it here.</p>
<p style="font-size:1.125rem;line-height:1.5">Pages opened while online — today's list and its installs — still open without signal, and taps made ` +
  `there are kept on this tablet until they can be sent.</p>
<p style="margin-top:1.5rem"><a href="/today" style="display:inline-block;min-height:3rem;line-height:3rem;padding:0 ` +
  `1.25rem;border-radius:0.5rem;background:#115e59;color:#fff;font-size:1.125rem;font-weight:600;text-decoration:none">Open today's list</a></p>
</main>
</body>
</html>`;

export function offlinePageResponse(): Response {
  // 503 so that nothing (the browser, a cache) takes this page for the real one.
  return new Response(OFFLINE_PAGE_HTML, {
    status: 503,
    headers: { 'content-type': 'text/html; charset=utf-8', 'cache-control': 'no-store' },
  });
}
