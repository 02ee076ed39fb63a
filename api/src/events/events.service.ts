import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction, WhereOptions } from 'sequelize';
import { User } from '../users/models/user.model.js';
import type { Page } from '../common/page.js';
import { Event } from './models/event.model.js';

export interface EventInput {
  readonly type: string;
  readonly actorId: number | null;
  readonly projectId?: number | null;
  readonly submittalId?: number | null;
  readonly discrepancyId?: number | null;
  readonly data?: Record<string, unknown>;
}

export interface EventView {
  id: number;
  type: string;
  at: string;
  actor: { id: number; name: string; role: string } | null;
  projectId: number | null;
  submittalId: number | null;
  discrepancyId: number | null;
  data: Record<string, unknown>;
}

/** The append-only log: who did what, when. Writers pass their transaction so the entry lands with the change. */
@Injectable()
export class EventsService {
  constructor(@InjectModel(Event) private readonly events: typeof Event) {}

  async record(input: EventInput, transaction?: Transaction): Promise<void> {
    await this.events.create(
      {
        type: input.type,
        actorId: input.actorId,
        projectId: input.projectId ?? null,
        submittalId: input.submittalId ?? null,
        discrepancyId: input.discrepancyId ?? null,
        data: input.data ?? {},
      },
      { transaction },
    );
  }

  async list(where: WhereOptions<Event>, page = 1, pageSize = 100): Promise<Page<EventView>> {
    const { rows, count } = await this.events.findAndCountAll({
      where,
      include: [{ model: User, attributes: ['id', 'name', 'role'] }],
      order: [['id', 'ASC']],
      limit: pageSize,
      offset: (page - 1) * pageSize,
    });
    return { items: rows.map((e) => this.view(e)), total: count, page, pageSize };
  }

  view(e: Event): EventView {
    return {
      id: e.id,
      type: e.type,
      at: new Date(e.createdAt).toISOString(),
      actor: e.actor ? { id: e.actor.id, name: e.actor.name, role: e.actor.role } : null,
      projectId: e.projectId,
      submittalId: e.submittalId,
      discrepancyId: e.discrepancyId,
      data: e.data,
    };
  }
}
