// The local SMTP catcher: accepts every message (and any login) on 127.0.0.1, stores each as a
// .eml file and prints one line about it. Nothing is relayed anywhere.
//   node scripts/mail-catcher.mjs [--port 2525] [--host 127.0.0.1] [--dir data/mail]
// or MAIL_CATCHER_PORT / MAIL_CATCHER_HOST / MAIL_CATCHER_DIR. `npm run demo` starts one.
import { randomBytes } from "node:crypto";
import { mkdirSync, renameSync, writeFileSync } from "node:fs";
import path from "node:path";
import { SMTPServer } from "smtp-server";

const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), "..");

function headerOf(raw, name) {
  const head = raw.split(/\r?\n\r?\n/)[0].replace(/\r?\n[ \t]+/g, " ");
  const line = head.split(/\r?\n/).find((l) => l.toLowerCase().startsWith(`${name.toLowerCase()}:`));
  return line ? line.slice(name.length + 1).trim() : "";
}

const shown = (file) => (path.relative(process.cwd(), file).startsWith("..") ? file : path.relative(process.cwd(), file));

/** Starts a catcher; resolves once it listens, with the port it got and a close(). */
export function startMailCatcher({ port = 2525, host = "127.0.0.1", dir = path.join(root, "data", "mail"), log = console.log } = {}) {
  mkdirSync(dir, { recursive: true });
  let seq = 0;
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ["STARTTLS"],
    authOptional: true,
    allowInsecureAuth: true,
    logger: false,
    size: 25 * 1024 * 1024,
    onAuth(auth, _session, done) {
      done(null, { user: auth.username || "anyone" });
    },
    onData(stream, session, done) {
      const chunks = [];
      stream.on("data", (c) => chunks.push(c));
      stream.on("end", () => {
        const raw = Buffer.concat(chunks);
        const stamp = new Date().toISOString().replace(/[:.]/g, "-");
        const name = `${stamp}-${String(++seq).padStart(4, "0")}-${randomBytes(3).toString("hex")}.eml`;
        const file = path.join(dir, name);
        // Written whole, then renamed, so a reader never sees half a message.
        writeFileSync(`${file}.part`, raw);
        renameSync(`${file}.part`, file);
        const to = session.envelope.rcptTo.map((r) => r.address).join(", ");
        log(`mail-catcher: ${new Date().toISOString()} to ${to} "${headerOf(raw.toString("utf8"), "Subject")}" → ${shown(file)}`);
        done();
      });
    },
  });
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => {
      server.off("error", reject);
      server.on("error", (err) => log(`mail-catcher: ${err.message}`));
      const actual = server.server.address().port;
      resolve({ port: actual, host, dir, close: () => new Promise((r) => server.close(() => r())) });
    });
  });
}

function arg(name) {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? process.argv[i + 1] : undefined;
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(new URL(import.meta.url).pathname)) {
  const port = Number(arg("port") ?? process.env.MAIL_CATCHER_PORT ?? 2525);
  const host = arg("host") ?? process.env.MAIL_CATCHER_HOST ?? "127.0.0.1";
  const dir = path.resolve(arg("dir") ?? process.env.MAIL_CATCHER_DIR ?? path.join(root, "data", "mail"));
  startMailCatcher({ port, host, dir }).then(
    (c) => {
      console.log(`mail-catcher: listening on smtp://${c.host}:${c.port}, saving to ${c.dir}`);
      const stop = () => c.close().then(() => process.exit(0));
      process.on("SIGINT", stop);
      process.on("SIGTERM", stop);
    },
    (err) => {
      console.error(`mail-catcher: cannot listen on ${host}:${port}: ${err.message}`);
      process.exit(1);
    },
  );
}
