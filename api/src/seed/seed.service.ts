import { Injectable, Logger } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { Sequelize } from 'sequelize-typescript';
import type { AuthUser } from '../auth/auth-user.js';
import { hashPassword } from '../auth/password.js';
import { Role } from '../auth/role.enum.js';
import { DiscrepanciesService } from '../discrepancies/discrepancies.service.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { Organisation } from '../organisations/models/organisation.model.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { Project } from '../projects/models/project.model.js';
import { SubmittalsService } from '../submittals/submittals.service.js';
import { InvitationsService } from '../users/invitations.service.js';
import { User } from '../users/models/user.model.js';
import { UsersService } from '../users/users.service.js';

/** The seed's calc files: api/src/seed/calc (the same path from src/seed and dist/seed). */
export const SEED_CALC_DIR = fileURLToPath(new URL('../../src/seed/calc/', import.meta.url));

export function readSeedFiles(folder: string): { name: string; content: Buffer }[] {
  const dir = `${SEED_CALC_DIR}${folder}/`;
  return readdirSync(dir)
    .filter((f) => f.endsWith('.json'))
    .sort()
    .map((name) => ({ name, content: readFileSync(`${dir}${name}`) }));
}

export interface SeedResult {
  projectId: number;
  submittalIds: number[];
}

/**
 * The fictional demo: Harbour Lantern Footbridge. Everything after the users goes through the real
 * services (upload → engine → discrepancies → moves → stamp), so the data is what the service would
 * have produced.
 */
@Injectable()
export class SeedService {
  static readonly DEMO_PASSWORD = 'lantern-demo-2026';
  static readonly DEMO_USERS = [
    {
      email: 'sam@tidewater-crossing.example.test',
      name: 'Sam Oduya',
      role: Role.Admin,
      org: 'Tidewater Crossing Authority',
    },
    {
      email: 'priya@fennick-ode.example.test',
      name: 'Priya Halvorsen',
      role: Role.Consultant,
      org: 'Fennick & Ode Structural',
    },
    {
      email: 'tomasz@larchmont-review.example.test',
      name: 'Tomasz Quell',
      role: Role.Checker,
      org: 'Larchmont Peer Review',
    },
    {
      email: 'adaeze@tidewater-crossing.example.test',
      name: 'Adaeze Marlow',
      role: Role.OwnerRep,
      org: 'Tidewater Crossing Authority',
    },
  ] as const;

  private readonly logger = new Logger(SeedService.name);

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(User) private readonly userModel: typeof User,
    @InjectModel(Organisation) private readonly organisations: typeof Organisation,
    @InjectModel(Project) private readonly projects: typeof Project,
    @InjectModel(ProjectMember) private readonly members: typeof ProjectMember,
    @InjectModel(Discrepancy) private readonly discrepancies: typeof Discrepancy,
    private readonly users: UsersService,
    private readonly submittals: SubmittalsService,
    private readonly discrepancyService: DiscrepanciesService,
    private readonly invitations: InvitationsService,
  ) {}

  /** Seeds when there are no users yet; returns what it made, or null when it did nothing. */
  async seedIfEmpty(): Promise<SeedResult | null> {
    if ((await this.userModel.count()) > 0) return null;
    const result = await this.seed();
    this.logger.log(
      `Seeded the demo: project ${result.projectId}, submittals ${result.submittalIds.join(', ')}`,
    );
    return result;
  }

  private async seed(): Promise<SeedResult> {
    const passwordHash = await hashPassword(SeedService.DEMO_PASSWORD);
    const people = await this.sequelize.transaction(async (transaction) => {
      const orgs = new Map<string, Organisation>();
      const kinds: Record<string, Organisation['kind']> = {
        'Tidewater Crossing Authority': 'owner',
        'Fennick & Ode Structural': 'consultant',
        'Larchmont Peer Review': 'checker',
      };
      for (const [name, kind] of Object.entries(kinds))
        orgs.set(name, await this.organisations.create({ name, kind }, { transaction }));
      const made = new Map<Role, AuthUser>();
      for (const u of SeedService.DEMO_USERS) {
        const row = await this.userModel.create(
          {
            email: u.email,
            name: u.name,
            role: u.role,
            organisationId: orgs.get(u.org)?.id ?? null,
            passwordHash,
            active: true,
          },
          { transaction },
        );
        made.set(u.role, this.users.toAuthUser(row));
      }
      const project = await this.projects.create(
        {
          name: 'Harbour Lantern Footbridge',
          reference: 'HLF-2026',
          description:
            'Fictional demo: a 48 m steel truss footbridge; bolted chord splices, gussets and hanger plates.',
          ownerOrganisationId: orgs.get('Tidewater Crossing Authority')?.id ?? null,
        },
        { transaction },
      );
      for (const u of made.values()) {
        if (u.role !== Role.Admin)
          await this.members.create({ projectId: project.id, userId: u.id }, { transaction });
      }
      return { made, projectId: project.id };
    });
    const who = (role: Role): AuthUser => people.made.get(role) as AuthUser;
    const priya = who(Role.Consultant);
    const tomasz = who(Role.Checker);
    const { projectId } = people;

    const first = await this.submittals.upload(
      projectId,
      { title: 'Deck chord splices and hanger plates, issue A' },
      readSeedFiles('rev-a'),
      priya,
    );
    const raised = await this.discrepancies.findAll({
      where: { submittalId: first.submittalId },
      order: [['id', 'ASC']],
    });
    // Work part of the list the way a review goes: the consultant answers, the checker decides.
    const byClass = (c: string) => raised.filter((d) => d.class === c);
    for (const d of byClass('understated')) {
      await this.discrepancyService.move(
        d.id,
        { to: 'answered', note: 'Conservative by design; we kept the hand values.' },
        priya,
      );
      await this.discrepancyService.move(d.id, { to: 'accepted' }, tomasz);
    }
    for (const d of byClass('detailing').slice(0, 1)) {
      await this.discrepancyService.move(
        d.id,
        { to: 'waived', note: 'Edge distance agreed with the fabricator; sheared edge checked separately.' },
        tomasz,
      );
    }
    for (const d of byClass('chain-width').slice(0, 1)) {
      await this.discrepancyService.move(
        d.id,
        { to: 'answered', note: 'Typo in the gauge; corrected in issue B.' },
        priya,
      );
      await this.discrepancyService.move(
        d.id,
        { to: 'returned', note: 'Please show the corrected chain in the calc, not only in the note.' },
        tomasz,
      );
    }
    const firstError = raised.find((d) => d.severity === 'error' && d.status === 'raised');
    if (firstError)
      await this.discrepancyService.comment(
        firstError.id,
        { body: 'The zigzag through the second gauge line governs here; see the least chains.' },
        tomasz,
      );
    await this.submittals.stamp(
      first.submittalId,
      {
        action: 'revise-and-resubmit',
        comment: 'Net sections of the deck splices are overstated; resubmit with the governing chains.',
        overrideReason:
          'Returning the submittal for revision: the open errors are the reason for this stamp.',
      },
      tomasz,
    );

    const second = await this.submittals.upload(
      projectId,
      { title: 'Deck chord splices and hanger plates, issue B', revisionOf: first.submittalId },
      readSeedFiles('rev-b'),
      priya,
    );
    // Issue B re-checked every file but the hanger's (not reissued): what it fixed is resolved, the
    // rest carried on with its status. Work on the current items goes on in issue B.
    const carried = await this.discrepancies.findAll({
      where: { submittalId: second.submittalId },
      order: [['id', 'ASC']],
    });
    const newInB = carried.find((d) => d.carriedFromId === null && d.status === 'raised');
    if (newInB) {
      await this.discrepancyService.move(
        newInB.id,
        { to: 'answered', note: 'The tie was re-rated in issue B; the claim follows the new plate.' },
        priya,
      );
      await this.discrepancyService.assign(newInB.id, { assigneeId: tomasz.id }, tomasz);
    }
    const returned = carried.find((d) => d.status === 'returned');
    if (returned)
      await this.discrepancyService.assign(
        returned.id,
        { assigneeId: priya.id, dueDate: '2026-12-18' },
        tomasz,
      );
    const accepted = carried.find((d) => d.status === 'accepted' && d.memberId === 'G-2');
    if (accepted)
      await this.discrepancyService.move(
        accepted.id,
        {
          to: 'returned',
          note: 'Reopened: show Ae of the issue B gusset in the calc itself, not only in the note.',
        },
        tomasz,
      );
    await this.invitations.create(
      { email: 'noor@fennick-ode.example.test', name: 'Noor Castellan', role: Role.Consultant },
      who(Role.Admin),
    );
    return { projectId, submittalIds: [first.submittalId, second.submittalId] };
  }
}
