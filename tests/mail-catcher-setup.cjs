// Jest global setup: the mail catcher (maildev) that integration tests send real SMTP mail to.
// `npm test` starts one before Jest and exports MAIL_CATCHER_URL and SMTP_URL; a targeted `npx jest`
// run gets its own, on free ports, stopped again by mail-catcher-teardown.cjs.
const { spawn } = require('node:child_process');
const { mkdtempSync } = require('node:fs');
const net = require('node:net');
const { tmpdir } = require('node:os');
const { join } = require('node:path');

const freePort = () =>
  new Promise((resolve, reject) => {
    const server = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
    server.on('error', reject);
  });

module.exports = async function startMailCatcher() {
  if (process.env.MAIL_CATCHER_URL && process.env.SMTP_URL) return;
  const [smtp, web] = [await freePort(), await freePort()];
  const child = spawn(
    process.execPath,
    [join(__dirname, '..', 'node_modules', '.bin', 'maildev'), '--smtp', String(smtp), '--web', String(web), '--ip', '127.0.0.1', '--web-ip', '127.0.0.1', '--mail-directory', mkdtempSync(join(tmpdir(), 'baleproof-mail-'))],
    { stdio: 'ignore' },
  );
  globalThis.__mailCatcher = child;
  const url = `http://127.0.0.1:${web}`;
  for (let i = 0; i < 150; i++) {
    if (child.exitCode !== null) throw new Error('maildev exited while starting');
    if (await fetch(`${url}/api/healthz`).then((r) => r.ok, () => false)) {
      process.env.MAIL_CATCHER_URL = url;
      process.env.SMTP_URL = `smtp://127.0.0.1:${smtp}`;
      return;
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  child.kill();
  throw new Error(`maildev did not answer at ${url}`);
};
