import { ForbiddenException, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { FindingClass, Severity } from 'ligament';
import { Op } from 'sequelize';
import { csvDocument } from '../common/csv.js';
import { quantityCells } from '../discrepancies/quantity.js';
import type { AuthUser } from '../auth/auth-user.js';
import { ProjectAccessService } from '../auth/project-access.service.js';
import { OPEN_STATUSES } from '../discrepancies/discrepancy-status.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { Project } from '../projects/models/project.model.js';
import { Submittal } from '../submittals/models/submittal.model.js';
import { FINDING_CLASSES, SEVERITIES } from '../submittals/submittal-summary.js';
import type { DashboardDto } from './dto/dashboard.dto.js';

const DAY = 86_400_000;

/**
 * Open findings across the caller's projects, by class, severity and age, and the trend per
 * submittal. Only current items count (not superseded by a later revision); `superseded` says how
 * many open-looking items a revision has taken over, so nobody wonders where they went.
 */
@Injectable()
export class DashboardService {
  constructor(
    @InjectModel(Discrepancy) private readonly discrepancies: typeof Discrepancy,
    @InjectModel(Submittal) private readonly submittals: typeof Submittal,
    @InjectModel(Project) private readonly projects: typeof Project,
    private readonly access: ProjectAccessService,
  ) {}

  async dashboard(user: AuthUser, projectId?: number, now = new Date()): Promise<DashboardDto> {
    const ids = await this.scope(user, projectId);
    const [projects, submittals, discrepancies] = await Promise.all([
      this.projects.findAll({ where: { id: { [Op.in]: ids } }, order: [['id', 'ASC']] }),
      this.submittals.findAll({
        where: { projectId: { [Op.in]: ids } },
        attributes: ['id', 'projectId', 'title', 'createdAt'],
        order: [
          ['createdAt', 'ASC'],
          ['id', 'ASC'],
        ],
      }),
      this.discrepancies.findAll({
        where: { projectId: { [Op.in]: ids } },
        attributes: [
          'projectId',
          'submittalId',
          'class',
          'severity',
          'status',
          'firstRaisedAt',
          'supersededBySubmittalId',
        ],
        raw: true,
      }),
    ]);
    const openByClass = Object.fromEntries(FINDING_CLASSES.map((c) => [c, 0])) as Record<
      FindingClass,
      number
    >;
    const openBySeverity = Object.fromEntries(SEVERITIES.map((s) => [s, 0])) as Record<Severity, number>;
    const openByAge = { week: 0, month: 0, quarter: 0, older: 0 };
    const perProject = new Map<number, { open: number; openErrors: number }>();
    const perSubmittal = new Map<
      number,
      { raised: number; open: number; bySeverity: Record<Severity, number> }
    >();
    let openTotal = 0;
    let superseded = 0;
    for (const d of discrepancies) {
      const current = d.supersededBySubmittalId === null;
      if (!current) superseded++;
      const open = current && OPEN_STATUSES.includes(d.status);
      const s = perSubmittal.get(d.submittalId) ?? {
        raised: 0,
        open: 0,
        bySeverity: { error: 0, warning: 0, note: 0 },
      };
      s.raised++;
      s.bySeverity[d.severity]++;
      if (open) s.open++;
      perSubmittal.set(d.submittalId, s);
      if (!open) continue;
      openTotal++;
      openByClass[d.class]++;
      openBySeverity[d.severity]++;
      const age = (now.getTime() - new Date(d.firstRaisedAt).getTime()) / DAY;
      if (age <= 7) openByAge.week++;
      else if (age <= 30) openByAge.month++;
      else if (age <= 90) openByAge.quarter++;
      else openByAge.older++;
      const p = perProject.get(d.projectId) ?? { open: 0, openErrors: 0 };
      p.open++;
      if (d.severity === 'error') p.openErrors++;
      perProject.set(d.projectId, p);
    }
    return {
      projects: projects.map((p) => ({
        id: p.id,
        name: p.name,
        open: perProject.get(p.id)?.open ?? 0,
        openErrors: perProject.get(p.id)?.openErrors ?? 0,
        submittals: submittals.filter((s) => s.projectId === p.id).length,
      })),
      openTotal,
      superseded,
      openByClass,
      openBySeverity,
      openByAge,
      trend: submittals.map((s) => {
        const t = perSubmittal.get(s.id) ?? {
          raised: 0,
          open: 0,
          bySeverity: { error: 0, warning: 0, note: 0 },
        };
        return {
          submittalId: s.id,
          projectId: s.projectId,
          title: s.title,
          date: new Date(s.createdAt).toISOString(),
          ...t,
        };
      }),
      generatedAt: now.toISOString(),
    };
  }

  /**
   * Every current open discrepancy of the caller's projects as CSV (RFC 4180, UTF-8 with BOM, header
   * row), with the quantity, unit and unit system of the claimed and recomputed numbers.
   */
  async openCsv(user: AuthUser, projectId?: number, now = new Date()): Promise<string> {
    const ids = await this.scope(user, projectId);
    const [projects, rows] = await Promise.all([
      this.projects.findAll({ where: { id: { [Op.in]: ids } }, attributes: ['id', 'name'] }),
      this.discrepancies.findAll({
        where: {
          projectId: { [Op.in]: ids },
          status: { [Op.in]: [...OPEN_STATUSES] },
          supersededBySubmittalId: null,
        },
        order: [
          ['projectId', 'ASC'],
          ['id', 'ASC'],
        ],
        raw: true,
      }),
    ]);
    const names = new Map(projects.map((p) => [p.id, p.name]));
    const header = [
      'project',
      'submittal',
      'discrepancy',
      'file',
      'member',
      'code',
      'name',
      'class',
      'severity',
      'status',
      'chain',
      'quantity',
      'claimed',
      'recomputed',
      'unit',
      'unit_system',
      'age_days',
      'raised_at',
      'message',
    ];
    const lines = rows.map((d) => {
      return [
        names.get(d.projectId),
        d.submittalId,
        d.id,
        d.fileName,
        d.memberId,
        d.code,
        d.name,
        d.class,
        d.severity,
        d.status,
        d.chain ? d.chain.split(',').join(' ') : '',
        ...quantityCells(d, d.units),
        d.units,
        Math.floor((now.getTime() - new Date(d.firstRaisedAt).getTime()) / DAY),
        new Date(d.firstRaisedAt).toISOString(),
        d.message,
      ];
    });
    return csvDocument(header, lines);
  }

  private async scope(user: AuthUser, projectId?: number): Promise<number[]> {
    const visible = await this.access.visibleProjectIds(user);
    if (projectId === undefined) return visible;
    if (!visible.includes(projectId)) throw new ForbiddenException('You are not a member of this project.');
    return [projectId];
  }
}
