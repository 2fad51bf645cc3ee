import { createServer, type Server } from 'node:http';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { renderInbox } from './inbox-page';

/** One message caught by the sink, as tests and the demo inbox read it. */
export interface CaughtMessage {
  id: number;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

export interface RunningMailSink {
  smtpPort: number;
  httpPort: number;
  stop(): Promise<void>;
}

/**
 * Stand-in for an SMTP relay: accepts every message on 127.0.0.1 and shows it at
 * `GET /messages` (JSON, newest first) and `GET /` (a readable inbox for the demo).
 */
export async function startMailSink(smtpPort: number, httpPort: number): Promise<RunningMailSink> {
  const messages: CaughtMessage[] = [];
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          messages.unshift({
            id: messages.length + 1,
            receivedAt: new Date().toISOString(),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to: session.envelope.rcptTo.map((rcpt) => rcpt.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
          });
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolveListen) => smtp.listen(smtpPort, '127.0.0.1', resolveListen));
  const http = createServer((request, response) => {
    if (request.method === 'DELETE' && request.url === '/messages') {
      messages.length = 0;
      response.writeHead(204).end();
    } else if (request.url === '/messages') {
      response.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify(messages));
    } else {
      response
        .writeHead(200, { 'content-type': 'text/html; charset=utf-8' })
        .end(renderInbox(messages));
    }
  });
  await listen(http, httpPort);
  return {
    smtpPort,
    httpPort,
    stop: async () => {
      await new Promise<void>((done) => smtp.close(() => done()));
      await new Promise<void>((done) => http.close(() => done()));
    },
  };
}

function listen(server: Server, port: number): Promise<void> {
  return new Promise((resolveListen, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolveListen());
  });
}
