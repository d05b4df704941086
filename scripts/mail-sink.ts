// The local SMTP stand-in: accepts mail on loopback and stores each message in MariaDB
// (captured_mails) so the admin "Mail" page can show it. Development and tests only.
import "./load-env";
import { writeFileSync, rmSync, mkdirSync } from "node:fs";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";
import { captureMail } from "@/db/queries/mail";
import { closeDb } from "@/db/client";

const port = Number(process.env.SMTP_PORT ?? 2525);
const pidFile = process.env.MAIL_SINK_PID_FILE ?? `.data/mail-sink-${port}.pid`;

const server = new SMTPServer({
  authOptional: true,
  // smtp-server's built-in certificate has expired; plain SMTP on loopback only.
  disabledCommands: ["STARTTLS", "AUTH"],
  banner: "Roostline mail stand-in",
  size: 5 * 1024 * 1024,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then(async (parsed) => {
        await captureMail({
          envelopeFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
          envelopeTo: session.envelope.rcptTo.map((r) => r.address).join(","),
          subject: (parsed.subject ?? "(no subject)").slice(0, 255),
          textBody: parsed.text ?? "",
          htmlBody: typeof parsed.html === "string" ? parsed.html : null,
        });
        callback();
      })
      .catch((err: Error) => {
        console.error("[mail-sink] could not store a message:", err.message);
        callback(Object.assign(new Error("451 could not store the message, try later"), { responseCode: 451 }));
      });
  },
});

server.on("error", (err) => {
  console.error("[mail-sink]", err.message);
  process.exit(1);
});

server.listen(port, "127.0.0.1", () => {
  mkdirSync(".data", { recursive: true });
  writeFileSync(pidFile, String(process.pid));
  console.log(`[mail-sink] listening on 127.0.0.1:${port}`);
});

function stop() {
  server.close(() => {
    rmSync(pidFile, { force: true });
    void closeDb().finally(() => process.exit(0));
  });
}
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
