import type { Role } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { Membership, Project, User, Workspace } from '../models/init-models';
import { seedDemoDesigns } from './demo-designs';

/** The invented demo workspace. Every name here is made up. */
export const DEMO_PASSWORD = 'kestrel-demo-2026';
export const DEMO_WORKSPACE = 'Kestrel Bay Sports Lab';
export const DEMO_USERS: { email: string; name: string; role: Role | null; isOperator?: boolean }[] = [
  { email: 'owner@kestrelbay.test', name: 'Ines Halloran', role: 'owner' },
  { email: 'admin@kestrelbay.test', name: 'Tobiah Renwick', role: 'admin' },
  { email: 'designer@kestrelbay.test', name: 'Priya Castell', role: 'designer' },
  { email: 'reviewer@kestrelbay.test', name: 'Dov Ashworth', role: 'reviewer' },
  { email: 'operator@tumblewise.test', name: 'Rena Platform', role: null, isOperator: true },
];
const DEMO_PROJECTS = [
  { name: 'Training javelin 600 g', category: 'javelin', notes: 'Indoor training implement with a rubber tip.' },
  { name: 'Junior racket', category: 'racket', notes: 'Three variants under study; one of them tumbles.' },
  { name: 'Juggling baton', category: 'juggling', notes: 'Weighted ends, foam grip.' },
  { name: 'Flying disc 175 g', category: 'flying-disc', notes: 'Rim-weighted ultimate disc.' },
] as const;

/** Seeds the demo workspace once, then its designs once; answers whether anything was added. */
export async function seedDemo(ctx: AppContext): Promise<boolean> {
  const accounts = await seedDemoAccounts(ctx);
  const owner = await Membership.findOne({
    where: { role: 'owner' },
    include: [
      { model: User, as: 'user', where: { email: DEMO_USERS[0].email }, required: true },
      { model: Workspace, as: 'workspace', required: true },
    ],
  });
  const designs = owner ? await seedDemoDesigns(ctx, owner.workspace!) : false;
  return accounts || designs;
}

async function seedDemoAccounts(ctx: AppContext): Promise<boolean> {
  if (await User.findOne({ where: { email: DEMO_USERS[0].email } })) return false;
  const passwordHash = await ctx.passwords.hash(DEMO_PASSWORD);
  await ctx.sequelize.transaction(async (transaction) => {
    const workspace = await Workspace.create({ name: DEMO_WORKSPACE }, { transaction });
    let ownerId = '';
    for (const u of DEMO_USERS) {
      const user = await User.create({ email: u.email, name: u.name, passwordHash, isOperator: u.isOperator ?? false }, { transaction });
      if (u.role) await Membership.create({ workspaceId: workspace.id, userId: user.id, role: u.role }, { transaction });
      if (u.role === 'owner') ownerId = user.id;
    }
    await recordAudit(
      {
        workspaceId: workspace.id,
        actorId: ownerId,
        action: 'workspace.created',
        targetType: 'workspace',
        targetId: workspace.id,
        targetLabel: workspace.name,
      },
      transaction,
    );
    for (const p of DEMO_PROJECTS) {
      await Project.create(
        { workspaceId: workspace.id, name: p.name, category: p.category, notes: p.notes, createdById: ownerId },
        { transaction },
      );
    }
  });
  return true;
}
