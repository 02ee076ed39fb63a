import {
  BeforeApplicationShutdown,
  Inject,
  Injectable,
  Logger,
  OnApplicationBootstrap,
  OnApplicationShutdown,
} from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectModel } from '@nestjs/sequelize';
import nodemailer from 'nodemailer';
import type { Transporter } from 'nodemailer';
import { col, fn, Op, type Transaction } from 'sequelize';
import { mailConfig } from '../config/index.js';
import { OutboxMessage, type MailKind } from './models/outbox-message.model.js';
import { SmtpFakeService } from './smtp-fake.service.js';

export interface MailDraft {
  readonly kind: MailKind;
  readonly to: string;
  readonly subject: string;
  readonly text: string;
}

export interface FlushResult {
  sent: number;
  failed: number;
}

export interface MailHealth {
  ok: boolean;
  transport: string;
  fake: boolean;
  fakeRunning: boolean;
  pending: number;
  oldestPendingAt: string | null;
  lastError: string | null;
}

/**
 * A message claimed for sending is not due again before this: if the process dies mid-send, or the
 * row cannot be marked sent, it is retried only after this lease (never twice at once).
 */
const SENDING_LEASE_MS = 10 * 60_000;

/** Retry delay after the n-th failed attempt: `baseMs` doubling, at most 10 min. Never given up. */
export function retryDelayMs(attempts: number, baseMs = 5000): number {
  return Math.min(baseMs * 2 ** Math.max(0, attempts - 1), 10 * 60_000);
}

/**
 * Mail goes through the outbox: callers add a row inside their own transaction (so the mail exists
 * exactly when the change does); a worker sends due rows over SMTP and reschedules failures. An SMTP
 * outage therefore never fails a request, and nothing is lost.
 */
@Injectable()
export class MailService implements OnApplicationBootstrap, BeforeApplicationShutdown, OnApplicationShutdown {
  private readonly logger = new Logger(MailService.name);
  private timer: NodeJS.Timeout | null = null;
  private transporter: Transporter | null = null;
  private transporterPort: number | null = null;
  private flushing: Promise<FlushResult> | null = null;

  constructor(
    @Inject(mailConfig.KEY) private readonly config: ConfigType<typeof mailConfig>,
    @InjectModel(OutboxMessage) private readonly outbox: typeof OutboxMessage,
    private readonly fake: SmtpFakeService,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (this.fake.enabled) {
      const port = await this.fake.start();
      this.logger.log(`SMTP fake listening on 127.0.0.1:${port}`);
    }
    if (this.config.retryIntervalMs > 0) {
      this.timer = setInterval(
        () => void this.flush().catch((e: Error) => this.logger.warn(e.message)),
        this.config.retryIntervalMs,
      );
      this.timer.unref();
    }
  }

  /** Stops the worker and lets a running outbox step finish while the database is still open. */
  async beforeApplicationShutdown(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    await this.flushing?.catch(() => undefined);
  }

  async onApplicationShutdown(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    await this.flushing?.catch(() => undefined);
    this.transporter?.close();
    await this.fake.stop();
  }

  /** Adds messages to the outbox, in the caller's transaction. */
  async enqueue(drafts: readonly MailDraft[], transaction?: Transaction): Promise<void> {
    if (drafts.length === 0) return;
    const now = new Date();
    await this.outbox.bulkCreate(
      drafts.map((d) => ({ ...d, status: 'pending', attempts: 0, nextAttemptAt: now })),
      { transaction },
    );
  }

  /** Sends every due message once; concurrent calls share one run. */
  flush(): Promise<FlushResult> {
    this.flushing ??= this.sendDue().finally(() => {
      this.flushing = null;
    });
    return this.flushing;
  }

  async health(): Promise<MailHealth> {
    const [pending, failing] = await Promise.all([
      this.outbox.findOne({
        where: { status: 'pending' },
        attributes: [
          [fn('COUNT', col('id')), 'count'],
          [fn('MIN', col('createdAt')), 'oldest'],
        ],
        raw: true,
      }) as Promise<{ count: number; oldest: string | null } | null>,
      this.outbox.findOne({
        // A send that failed leaves its error; one claimed and still on its way has none (the
        // claim counts the attempt before sending), so it is not failing.
        where: { status: 'pending', attempts: { [Op.gt]: 0 }, lastError: { [Op.ne]: null } },
        attributes: ['lastError'],
        order: [['updatedAt', 'DESC']],
        raw: true,
      }),
    ]);
    return {
      ok: (!this.fake.enabled || this.fake.running) && !failing,
      transport: `smtp://${this.config.host}:${this.port() ?? '?'}`,
      fake: this.fake.enabled,
      fakeRunning: this.fake.running,
      pending: Number(pending?.count ?? 0),
      oldestPendingAt: pending?.oldest ? new Date(pending.oldest).toISOString() : null,
      lastError: failing?.lastError ?? null,
    };
  }

  private port(): number | null {
    if (this.config.port > 0) return this.config.port;
    return this.fake.enabled ? this.fake.port : 25;
  }

  private transport(): Transporter {
    const port = this.port() ?? 25;
    if (!this.transporter || this.transporterPort !== port) {
      this.transporter?.close();
      this.transporter = nodemailer.createTransport({
        host: this.config.host,
        port,
        secure: false,
        ignoreTLS: true,
        connectionTimeout: 5000,
        greetingTimeout: 5000,
        socketTimeout: 10_000,
      });
      this.transporterPort = port;
    }
    return this.transporter;
  }

  private async sendDue(): Promise<FlushResult> {
    const due = await this.outbox.findAll({
      where: { status: 'pending', nextAttemptAt: { [Op.lte]: new Date() } },
      order: [['id', 'ASC']],
      limit: 50,
    });
    const result: FlushResult = { sent: 0, failed: 0 };
    for (const message of due) {
      // Claim it first (compare-and-set on attempts): a message another run or process has claimed
      // is skipped, and a claimed one is not due again before the lease ends.
      const attempts = message.attempts + 1;
      const [claimed] = await this.outbox.update(
        { attempts, nextAttemptAt: new Date(Date.now() + SENDING_LEASE_MS) },
        { where: { id: message.id, status: 'pending', attempts: message.attempts } },
      );
      if (claimed !== 1) continue;
      try {
        await this.transport().sendMail({
          from: this.config.from,
          to: message.to,
          subject: message.subject,
          text: message.text,
        });
      } catch (error) {
        await this.outbox.update(
          {
            lastError: error instanceof Error ? error.message : String(error),
            nextAttemptAt: new Date(Date.now() + retryDelayMs(attempts, this.config.retryBaseMs)),
          },
          { where: { id: message.id } },
        );
        result.failed++;
        continue;
      }
      result.sent++;
      // Sent: a failure to record that must not count as a failed send (that would send it again).
      await this.outbox
        .update({ status: 'sent', sentAt: new Date(), lastError: null }, { where: { id: message.id } })
        .catch((error: unknown) =>
          this.logger.error(
            `Mail ${message.id} was sent but could not be marked sent (${error instanceof Error ? error.message : String(error)}); it stays claimed for ${SENDING_LEASE_MS / 60_000} min.`,
          ),
        );
    }
    if (result.failed > 0)
      this.logger.warn(`Mail: ${result.failed} message(s) could not be sent; they will be retried.`);
    return result;
  }
}
