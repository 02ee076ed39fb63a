import { Test } from '@nestjs/testing';
import { getModelToken } from '@nestjs/sequelize';
import { createHash } from 'node:crypto';
import { Role } from '../auth/role.enum.js';
import { EventsService } from '../events/events.service.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { User } from '../users/models/user.model.js';
import { ApiToken } from './models/api-token.model.js';
import { TokensService } from './tokens.service.js';

const sha = (s: string) => createHash('sha256').update(s).digest('hex');

describe('TokensService', () => {
  const row = { id: 7, userId: 2, projectId: 1, revokedAt: null as Date | null, update: jest.fn() };
  const tokens = { findOne: jest.fn(), create: jest.fn(), findAll: jest.fn(), findByPk: jest.fn() };
  const users = { findByPk: jest.fn() };
  const members = { count: jest.fn() };
  const events = { record: jest.fn() };
  let service: TokensService;

  beforeEach(async () => {
    jest.resetAllMocks();
    row.revokedAt = null;
    const moduleRef = await Test.createTestingModule({
      providers: [
        TokensService,
        { provide: getModelToken(ApiToken), useValue: tokens },
        { provide: getModelToken(User), useValue: users },
        { provide: getModelToken(ProjectMember), useValue: members },
        { provide: EventsService, useValue: events },
      ],
    }).compile();
    service = moduleRef.get(TokensService);
    tokens.findOne.mockResolvedValue(row);
    users.findByPk.mockResolvedValue({
      id: 2,
      email: 'priya@fennick-ode.example.test',
      name: 'Priya Halvorsen',
      role: Role.Consultant,
      organisationId: 2,
      active: true,
    });
    members.count.mockResolvedValue(1);
  });

  it('looks a token up by its sha256 and stands for its owner, scoped to its project', async () => {
    const user = await service.authenticate('lgt_secret');
    expect(tokens.findOne).toHaveBeenCalledWith({ where: { tokenHash: sha('lgt_secret') } });
    expect(user).toMatchObject({ id: 2, role: Role.Consultant, token: { id: 7, projectId: 1 } });
    expect(row.update).toHaveBeenCalledWith({ lastUsedAt: expect.any(Date) });
  });

  it('refuses a revoked token, an unknown one, an inactive owner and an owner who left the project', async () => {
    row.revokedAt = new Date();
    await expect(service.authenticate('lgt_secret')).resolves.toBeNull();
    row.revokedAt = null;
    tokens.findOne.mockResolvedValueOnce(null);
    await expect(service.authenticate('lgt_other')).resolves.toBeNull();
    users.findByPk.mockResolvedValueOnce({ id: 2, active: false });
    await expect(service.authenticate('lgt_secret')).resolves.toBeNull();
    members.count.mockResolvedValueOnce(0);
    await expect(service.authenticate('lgt_secret')).resolves.toBeNull();
  });

  it('creates a token only for a project the consultant is on, and stores only its hash', async () => {
    const actor = {
      id: 2,
      email: 'priya@fennick-ode.example.test',
      name: 'Priya Halvorsen',
      role: Role.Consultant,
      organisationId: 2,
    };
    tokens.create.mockImplementation(async (values: Record<string, unknown>) => ({
      id: 9,
      createdAt: new Date(),
      lastUsedAt: null,
      revokedAt: null,
      ...values,
    }));
    const created = await service.create({ name: 'CI', projectId: 1 }, actor);
    expect(created.token).toMatch(/^lgt_/);
    expect(tokens.create).toHaveBeenCalledWith(
      expect.objectContaining({ tokenHash: sha(created.token), prefix: created.token.slice(0, 8) }),
    );
    expect(JSON.stringify(tokens.create.mock.calls[0])).not.toContain(created.token.slice(8));
    members.count.mockResolvedValueOnce(0);
    await expect(service.create({ name: 'CI', projectId: 5 }, actor)).rejects.toThrow(
      'only for a project you are a member of',
    );
  });
});
