import { Inject, Injectable, Logger } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectModel } from '@nestjs/sequelize';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { mailConfig } from '../config/index.js';
import { parseMessage } from './parse-message.js';
import { MailboxMessage } from './models/mailbox-message.model.js';

/**
 * A local SMTP server (smtp-server, in-process) for the demo and the tests: every message it
 * receives is stored in `mailbox_messages` so it can be read at GET /api/mail/mailbox.
 */
@Injectable()
export class SmtpFakeService {
  private readonly logger = new Logger(SmtpFakeService.name);
  private server: SMTPServer | null = null;
  private boundPort: number | null = null;

  constructor(
    @Inject(mailConfig.KEY) private readonly config: ConfigType<typeof mailConfig>,
    @InjectModel(MailboxMessage) private readonly mailbox: typeof MailboxMessage,
  ) {}

  get enabled(): boolean {
    return this.config.fake;
  }

  get running(): boolean {
    return this.server !== null;
  }

  /** The port it listens on (kept across stop/start so a restarted fake is found again). */
  get port(): number | null {
    return this.boundPort;
  }

  async start(): Promise<number> {
    if (this.server && this.boundPort !== null) return this.boundPort;
    const wanted = this.boundPort ?? this.config.fakePort;
    try {
      return await this.listen(wanted);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EADDRINUSE' || this.boundPort !== null) throw error;
      this.logger.warn(`Port ${wanted} is taken; the SMTP fake listens on a free port instead.`);
      return this.listen(0);
    }
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = null;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  private listen(port: number): Promise<number> {
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      onData: (stream, _session, callback) => {
        const chunks: Buffer[] = [];
        stream.on('data', (chunk: Buffer) => chunks.push(chunk));
        stream.on('end', () => {
          const raw = Buffer.concat(chunks).toString('utf8');
          const message = parseMessage(raw);
          this.mailbox
            .create({ from: message.from, to: message.to, subject: message.subject, text: message.text, raw })
            .then(
              () => callback(),
              (error: Error) => callback(error),
            );
        });
      },
    });
    return new Promise((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, '127.0.0.1', () => {
        server.off('error', reject);
        server.on('error', (error) => this.logger.warn(`SMTP fake: ${error.message}`));
        this.server = server;
        this.boundPort = (server.server.address() as AddressInfo).port;
        resolve(this.boundPort);
      });
    });
  }
}
