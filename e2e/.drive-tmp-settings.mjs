// temp: save the settings page HTML through a running bench-like server — uses npm start's server on 4300
const base = 'http://127.0.0.1:4300';
const first = await fetch(`${base}/api/auth/session`);
const cookie0 = first.headers.get('set-cookie').split(';')[0];
const { csrfToken } = await first.json();
const r = await fetch(`${base}/api/auth/signin`, { method: 'POST', headers: { 'content-type': 'application/json', cookie: cookie0, 'x-csrf-token': csrfToken }, body: JSON.stringify({ email: 'owner@fernhollow.example', password: 'limewash-demo-2026' }) });
const cookie = r.headers.get('set-cookie').split(';')[0];
for (const path of process.argv.slice(2)) {
  const t0 = Date.now(); const page = await fetch(`${base}${path}`, { headers: { cookie } }); const html = await page.text();
  (await import('node:fs')).writeFileSync(`/tmp/lb/page${path.replaceAll('/', '_')}.html`, html);
  console.log(path, page.status, html.length, Date.now() - t0, 'ms');
}
