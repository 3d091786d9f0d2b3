import type { SpinReport } from '@tumblewise/engine';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { Measurement, Part, Project, ReviewEntry, User, Variant, Workspace } from '../models/init-models';
import { ENGINE_VERSION } from '../variants/engine-version';

/**
 * Invented design data of the demo workspace: every dimension and density here is made up for the
 * demo (not any brand's product). The junior racket's first variant is flip-prone on purpose.
 */
const racketParts = (spinAxis: [number, number, number], hoopDensity = 1500, label = '') => ({
  name: `Junior racket${label}`,
  category: 'racket',
  primitives: [
    { id: 'grip', shape: 'cylinder', radius: 0.0135, length: 0.19, position: [0, 0, 0.095], density: 650, mode: 'add' },
    { id: 'bore', shape: 'cylinder', radius: 0.008, length: 0.17, position: [0, 0, 0.095], density: 650, mode: 'remove' },
    { id: 'throat', shape: 'box', size: [0.02, 0.015, 0.12], position: [0, 0, 0.25], density: 1500 },
    {
      id: 'hoop',
      shape: 'torus',
      majorRadius: 0.11,
      minorRadius: 0.008,
      position: [0, 0, 0.42],
      rotationDeg: [90, 0, 0],
      density: hoopDensity,
    },
    { id: 'tape', shape: 'point', mass: 0.003, position: [0.11, 0, 0.42] },
  ],
  spin: { axis: spinAxis, rate: 31.4, misalignmentDeg: 1 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
});

const javelin = {
  name: 'Training javelin 600 g',
  category: 'javelin',
  division: 'women',
  primitives: [
    {
      id: 'shaft',
      shape: 'cylinder',
      radius: 0.0125,
      innerRadius: 0.0113,
      length: 2.05,
      position: [0, 0, 1.025],
      density: 1550,
      mode: 'add',
    },
    { id: 'tip', shape: 'cone', radius: 0.0125, length: 0.2, position: [0, 0, 2.05], density: 7850 },
    { id: 'cord', shape: 'cylinder', radius: 0.0145, innerRadius: 0.0125, length: 0.16, position: [0, 0, 1.39], density: 600 },
    { id: 'tail-ballast', shape: 'cylinder', radius: 0.0113, length: 0.02, position: [0, 0, 0.54], density: 11340 },
  ],
  spin: { axis: [0, 0, 1], rate: 20, misalignmentDeg: 1 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
};

const baton = {
  name: 'Juggling baton',
  category: 'juggling',
  primitives: [
    { id: 'rod', shape: 'capsule', radius: 0.009, length: 0.5, position: [0, 0, 0.3], density: 1200 },
    { id: 'knob-low', shape: 'sphere', radius: 0.03, position: [0, 0, 0.03], density: 300 },
    { id: 'knob-high', shape: 'sphere', radius: 0.03, position: [0, 0, 0.57], density: 300 },
    { id: 'grip-foam', shape: 'cylinder', radius: 0.015, innerRadius: 0.009, length: 0.2, position: [0, 0, 0.3], density: 100 },
  ],
  spin: { axis: [1, 0, 0], rate: 12.6, misalignmentDeg: 1 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
};

const disc = {
  name: 'Flying disc 175 g',
  category: 'flying-disc',
  primitives: [
    { id: 'rim', shape: 'torus', majorRadius: 0.125, minorRadius: 0.0065, position: [0, 0, 0], density: 1050 },
    { id: 'plate', shape: 'cylinder', radius: 0.125, length: 0.0012, position: [0, 0, 0.0059], density: 1050 },
  ],
  spin: { axis: [0, 0, 1], rate: 60, misalignmentDeg: 1 },
};

/** Seeds parts, variants, a review in progress and a measured-data upload once (when the demo workspace has no parts). */
export async function seedDemoDesigns(ctx: AppContext, workspace: Workspace): Promise<boolean> {
  if (await Part.count({ where: { workspaceId: workspace.id } })) return false;
  const user = async (email: string) => (await User.findOne({ where: { email } }))!;
  const [designer, reviewer] = await Promise.all([user('designer@kestrelbay.test'), user('reviewer@kestrelbay.test')]);
  const analyze = (doc: unknown) => ctx.compute.run<SpinReport>({ kind: 'analyze', part: doc });
  const plan: { project: string; part: string; variants: { label: string; notes: string; doc: object }[] }[] = [
    {
      project: 'Training javelin 600 g',
      part: 'Shaft assembly',
      variants: [{ label: 'aluminium shaft', notes: 'Lead ballast ahead of the grip.', doc: javelin }],
    },
    {
      project: 'Junior racket',
      part: 'Frame',
      variants: [
        {
          label: 'end-over-end throw test',
          notes: 'Spin about the face-plane axis across the handle: flips, as expected.',
          doc: racketParts([1, 0, 0]),
        },
        { label: 'spin about face normal', notes: 'Same frame spun flat: steady.', doc: racketParts([0, 1, 0], 1500, ' (flat spin)') },
        { label: 'lighter hoop', notes: 'Hoop laminate at 1350 kg/m³.', doc: racketParts([0, 1, 0], 1350, ' (light hoop)') },
      ],
    },
    { project: 'Juggling baton', part: 'Baton body', variants: [{ label: 'foam knobs', notes: '', doc: baton }] },
    { project: 'Flying disc 175 g', part: 'Disc shell', variants: [{ label: 'rim-weighted', notes: '', doc: disc }] },
  ];
  const reports = await Promise.all(plan.flatMap((p) => p.variants.map((v) => analyze(v.doc))));
  await ctx.sequelize.transaction(async (transaction) => {
    let k = 0;
    for (const p of plan) {
      const project = await Project.findOne({ where: { workspaceId: workspace.id, name: p.project }, transaction });
      if (!project) {
        k += p.variants.length;
        continue;
      }
      const part = await Part.create(
        { workspaceId: workspace.id, projectId: project.id, name: p.part, draft: p.variants[p.variants.length - 1].doc },
        { transaction },
      );
      let number = 0;
      for (const v of p.variants) {
        const variant = await Variant.create(
          {
            workspaceId: workspace.id,
            partId: part.id,
            number: ++number,
            label: v.label,
            notes: v.notes,
            document: v.doc,
            report: reports[k++],
            engineVersion: ENGINE_VERSION,
            authorId: designer.id,
          },
          { transaction },
        );
        if (p.part === 'Frame' && number === 2) {
          await variant.update({ status: 'in_review' }, { transaction });
          await ReviewEntry.create(
            {
              workspaceId: workspace.id,
              variantId: variant.id,
              kind: 'requested',
              authorId: designer.id,
              reviewerId: reviewer.id,
              body: 'Flat-spin version of the frame: please check before we order the hoop tooling.',
            },
            { transaction },
          );
          await ReviewEntry.create(
            {
              workspaceId: workspace.id,
              variantId: variant.id,
              kind: 'comment',
              authorId: reviewer.id,
              reviewerId: null,
              body: 'Looking at it now; the rig measurement came in close.',
            },
            { transaction },
          );
          const report = reports[k - 1];
          // Invented rig readings, a few per cent from the prediction.
          await Measurement.bulkCreate(
            [
              {
                workspaceId: workspace.id,
                variantId: variant.id,
                axis: 'major',
                value: report.principal.moments[0] * 1.031,
                enteredValue: report.principal.moments[0] * 1.031 * 1e7,
                enteredUnit: 'g·cm²',
                method: 'compound pendulum',
                createdById: designer.id,
              },
              ...(report.trade.swingweight
                ? [
                    {
                      workspaceId: workspace.id,
                      variantId: variant.id,
                      axis: 'swing',
                      value: report.trade.swingweight * 0.978,
                      enteredValue: report.trade.swingweight * 0.978 * 1e7,
                      enteredUnit: 'g·cm²',
                      method: 'swing rig',
                      createdById: designer.id,
                    },
                  ]
                : []),
            ],
            { transaction },
          );
          await recordAudit(
            {
              workspaceId: workspace.id,
              actorId: designer.id,
              action: 'review.requested',
              targetType: 'variant',
              targetId: variant.id,
              targetLabel: 'v2',
            },
            transaction,
          );
        }
      }
    }
  });
  return true;
}
