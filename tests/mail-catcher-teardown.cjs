// Stops the mail catcher mail-catcher-setup.cjs started (if it started one).
module.exports = async function stopMailCatcher() {
  const child = globalThis.__mailCatcher;
  if (!child || child.exitCode !== null) return;
  await new Promise((resolve) => {
    child.once('exit', resolve);
    child.kill();
  });
};
