// Waits until every URL given answers over HTTP (any status), or fails after 60 s.
const urls = process.argv.slice(2);
const deadline = Date.now() + 60_000;
for (const url of urls) {
  for (;;) {
    try {
      await fetch(url, { signal: AbortSignal.timeout(2000) });
      break;
    } catch {
      if (Date.now() > deadline) {
        console.error(`timed out waiting for ${url}`);
        process.exit(1);
      }
      await new Promise((r) => setTimeout(r, 250));
    }
  }
}
