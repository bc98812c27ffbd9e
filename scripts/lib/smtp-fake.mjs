// A local SMTP fake for development and tests: accepts every message on loopback, parses it,
// keeps it in memory and (when `dir` is given) writes it as JSON to that folder.
import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";

export async function startSmtpFake({ port = 0, dir } = {}) {
  const { SMTPServer } = await import("smtp-server");
  const { simpleParser } = await import("mailparser");
  const messages = [];
  const listeners = new Set();
  if (dir) mkdirSync(dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const message = {
            to: parsed.to ? [parsed.to].flat().map((a) => a.text).join(", ") : "",
            from: parsed.from?.text ?? "",
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            receivedAt: new Date().toISOString(),
          };
          messages.push(message);
          if (dir) writeFileSync(path.join(dir, `${Date.now()}-${messages.length}.json`), JSON.stringify(message, null, 2));
          for (const listener of listeners) listener(message);
          callback();
        })
        .catch(callback);
    },
  });
  await new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", resolve);
  });
  const address = server.server.address();
  return {
    port: typeof address === "object" && address ? address.port : port,
    messages,
    onMessage(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    close: () => new Promise((resolve) => server.close(resolve)),
  };
}
