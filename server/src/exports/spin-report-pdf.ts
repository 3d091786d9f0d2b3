import { readFileSync } from 'node:fs';
import PDFDocument from 'pdfkit';
import { toDisplay, type SpinReport } from '@tumblewise/engine';
import type { PartDrawing } from './part-outline';

export interface PdfVariant {
  partName: string;
  projectName: string;
  workspaceName: string;
  number: number;
  label: string;
  status: string;
  author: string | null;
  createdAt: Date;
  engineVersion: string;
  /** The side view of the part (partDrawing, worked out on a compute thread: meshes can be large). */
  drawing: PartDrawing;
  report: SpinReport;
}

const CAUTIONS = [
  'Figures are engineering estimates from idealised geometry and nominal densities. They do not certify conformance with any governing body’s rules; only that body’s own test decides.',
  'Thrown and swung implements can injure: test prototypes in a cleared area under your organisation’s safety rules.',
];

const fmt = (x: number | null | undefined, digits = 4) => {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  const text = Number(x.toPrecision(digits)).toLocaleString('en-GB');
  return text === '-0' ? '0' : text; // a tiny negative axis component rounds to "-0"
};
const gcm2 = (x: number | null | undefined) => (x === null || x === undefined ? '—' : `${fmt(toDisplay(x, 'inertia', 'g·cm²'))} g·cm²`);
const mm = (x: number | null | undefined) => (x === null || x === undefined ? '—' : `${fmt(toDisplay(x, 'length', 'mm'))} mm`);

/**
 * DejaVu Sans, from the dejavu-fonts-ttf package (read once, embedded as a subset): pdfkit's
 * built-in Helvetica cannot write ≥, − or λ, which the report uses.
 */
let font: Buffer | undefined;
const reportFont = () => (font ??= readFileSync(require.resolve('dejavu-fonts-ttf/ttf/DejaVuSans.ttf')));

/** The spin report of one variant as a PDF (pdfkit, with DejaVu Sans embedded: no font download). */
export function spinReportPdf(v: PdfVariant): Promise<Buffer> {
  const doc = new PDFDocument({
    size: 'A4',
    margin: 48,
    info: { Title: `${v.partName} v${v.number} — spin report`, Author: 'Tumblewise' },
  });
  doc.registerFont('report', reportFont()).font('report');
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const r = v.report;
  const teal = '#0f5c63';

  doc
    .fillColor(teal)
    .fontSize(20)
    .text(`${v.partName} · v${v.number}${v.label ? ` ${v.label}` : ''}`);
  doc
    .fillColor('#333')
    .fontSize(10)
    .text(
      `${v.projectName} · ${v.workspaceName} · status ${v.status.replace('_', ' ')} · ${v.author ?? 'unknown author'} · ${v.createdAt.toISOString().slice(0, 10)} · ${v.engineVersion}`,
    );
  doc.moveDown(0.6);
  const cautions = CAUTIONS.join(' ');
  const cautionHeight = doc.fontSize(8.5).heightOfString(cautions, { width: 483 }) + 14;
  doc.rect(doc.x, doc.y, 499, cautionHeight).fillAndStroke('#fff7e6', '#d9a441');
  doc.fillColor('#5a3d00').text(cautions, doc.x + 8, doc.y + 7, { width: 483 });
  doc.x = 48;
  doc.moveDown(1.4);

  const verdictColour = r.spin.verdict === 'steady' ? '#1b7a3a' : r.spin.verdict === 'watch' ? '#9a6a00' : '#b3261e';
  doc.fillColor(verdictColour).fontSize(15).text(`Verdict: ${r.spin.verdict} — nearest the ${r.spin.nearestAxis} axis`);
  doc.fillColor('#222').fontSize(10).text(r.spin.explanation, { width: 499 });
  doc.moveDown(0.6);

  drawPart(doc, v.drawing, r);

  const bottom = () => doc.page.height - doc.page.margins.bottom;
  /** Rows of a figure and its value; a row never splits across pages, a heading keeps its first rows. */
  const table = (title: string, rows: [string, string][]) => {
    if (doc.fontSize(12).y + 60 > bottom()) doc.addPage();
    doc.moveDown(0.5).fillColor(teal).text(title, 48).moveDown(0.2).fontSize(9.5);
    for (const [k, val] of rows) {
      const height = Math.max(doc.heightOfString(k, { width: 230 }), doc.heightOfString(val, { width: 257 }));
      if (doc.y + height > bottom()) doc.addPage();
      const y = doc.y;
      doc.fillColor('#444').text(k, 48, y, { width: 230 });
      doc.fillColor('#111').text(val, 290, y, { width: 257 });
      doc.y = y + height;
      doc.moveDown(0.15);
    }
    doc.x = 48;
  };
  table('Mass properties', [
    ['Mass', `${fmt(toDisplay(r.mass, 'mass', 'g'))} g`],
    ['Volume', `${fmt(toDisplay(r.volume, 'volume', 'cm³'))} cm³`],
    ['Centre of mass (part axes)', r.centerOfMass.map((c) => mm(c)).join(', ')],
    ['Principal moments I1 ≥ I2 ≥ I3', r.principal.moments.map(gcm2).join(' · ')],
    ...r.principal.axes.map(
      (a, i) => [`Axis ${['major', 'intermediate', 'minor'][i]}`, `[${a.map((c) => fmt(c, 3)).join(', ')}]`] as [string, string],
    ),
  ]);
  table('Spin', [
    ['Misalignment from nearest axis', `${fmt(r.spin.misalignmentDeg, 3)}°`],
    ['Margin (I1−I2)/I2', `${fmt(100 * r.spin.margins.major, 3)} %`],
    ['Margin (I2−I3)/I2', `${fmt(100 * r.spin.margins.minor, 3)} %`],
    ['Growth rate λ', r.spin.growthRate === null ? '—' : `${fmt(r.spin.growthRate)} 1/s (e-folding ${fmt(r.spin.eFoldingTime)} s)`],
    ['Predicted time to first flip', r.spin.flipTime === null ? '—' : `${fmt(r.spin.flipTime)} s`],
    ['Wobble frequency', r.spin.wobbleFrequency === null ? '—' : `${fmt(r.spin.wobbleFrequency)} rad/s`],
    ...motionRows(r.spin),
  ]);
  table('Trade figures', [
    ['Balance point from the butt', mm(r.trade.balancePoint)],
    ['Swingweight (axis 10 cm from the butt)', gcm2(r.trade.swingweight)],
    ['Recoil weight (axis through the balance point)', gcm2(r.trade.recoilWeight)],
    ['Twistweight (long axis)', gcm2(r.trade.twistweight)],
    ['Moment about the pivot', r.trade.pivot ? `${gcm2(r.trade.pivot.moment)} at ${mm(r.trade.pivot.distance)}` : '—'],
    ['Centre of percussion from the butt', mm(r.trade.pivot?.centreOfPercussion)],
  ]);
  if (r.checks.length) {
    table(
      'Category checks (indicative)',
      r.checks.map((c) => [c.title, `${c.status.toUpperCase()} — ${c.rule}`] as [string, string]),
    );
  }
  if (r.notes.length) {
    if (doc.fontSize(12).y + 60 > bottom()) doc.addPage();
    doc.moveDown(0.5).fillColor(teal).text('Notes', 48).fillColor('#222').fontSize(9);
    for (const n of r.notes) doc.text(`• ${n}`, { width: 499 });
  }
  doc.end();
  return done;
}

/** A side view of the part (long axis up when a grip frame is given), removals dashed. */
/** The axis the motion circles, its period and the flight time; reports stored before these were computed leave them out. */
function motionRows(spin: Partial<SpinReport['spin']>): [string, string][] {
  const rows: [string, string][] = [];
  if (spin.motionAxis !== undefined) {
    const cone = spin.coneHalfAngleDeg ?? null;
    rows.push(['Axis the motion circles', cone === null ? spin.motionAxis : `${spin.motionAxis} (cone half-angle ${fmt(cone, 3)}°)`]);
  }
  if (spin.wobblePeriod !== undefined)
    rows.push(['Period of the body-frame motion', spin.wobblePeriod === null ? '—' : `${fmt(spin.wobblePeriod)} s`]);
  if (spin.flightTime !== undefined) {
    const basis = spin.flightTimeSource === 'part' ? 'set for this part' : 'category default, a common practice estimate';
    rows.push(['Time in the air', spin.flightTime === null ? '—' : `${fmt(spin.flightTime)} s (${basis})`]);
  }
  return rows;
}

function drawPart(doc: PDFKit.PDFDocument, { right, up, outlines, meshesLeftOut }: PartDrawing, r: SpinReport): void {
  const all = outlines.flatMap((o) => o.points);
  if (all.length === 0) {
    if (meshesLeftOut > 0) doc.fillColor('#666').fontSize(7.5).text('No drawing: the uploaded meshes of this part could not be read.');
    return;
  }
  const box = { x: 48, y: doc.y, w: 499, h: 170 };
  const [minX, maxX] = [Math.min(...all.map((p) => p[0])), Math.max(...all.map((p) => p[0]))];
  const [minY, maxY] = [Math.min(...all.map((p) => p[1])), Math.max(...all.map((p) => p[1]))];
  const s = Math.min((box.w - 20) / Math.max(maxX - minX, 1e-9), (box.h - 20) / Math.max(maxY - minY, 1e-9));
  const tx = (x: number) => box.x + box.w / 2 + (x - (minX + maxX) / 2) * s;
  const ty = (y: number) => box.y + box.h / 2 - (y - (minY + maxY) / 2) * s;
  doc.save().rect(box.x, box.y, box.w, box.h).stroke('#cccccc');
  for (const o of outlines) {
    if (o.points.length === 1) {
      doc.circle(tx(o.points[0][0]), ty(o.points[0][1]), 2.5).fill('#b3261e');
      continue;
    }
    if (o.pieces) {
      // One path of counter-clockwise pieces filled by the non-zero rule: their union, holes kept, in one even tint.
      for (const piece of o.pieces) doc.polygon(...piece.map(([x, y]) => [tx(x), ty(y)] as [number, number]));
      if (o.mode === 'remove') doc.fill('#ffffff', 'non-zero');
      else doc.fillOpacity(0.55).fill('#7fb7bb', 'non-zero').fillOpacity(1);
      continue;
    }
    doc.polygon(...o.points.map(([x, y]) => [tx(x), ty(y)] as [number, number]));
    if (o.mode === 'remove') doc.dash(3, { space: 2 }).fillAndStroke('#ffffff', '#888888').undash();
    else doc.fillOpacity(0.55).fillAndStroke('#7fb7bb', teal()).fillOpacity(1);
  }
  const c = r.centerOfMass;
  const cx = tx(c[0] * right[0] + c[1] * right[1] + c[2] * right[2]),
    cy = ty(c[0] * up[0] + c[1] * up[1] + c[2] * up[2]);
  doc
    .circle(cx, cy, 3)
    .fill('#222')
    .fontSize(7)
    .fillColor('#222')
    .text('centre of mass', cx + 5, cy - 3);
  doc.restore();
  doc.x = 48;
  doc.y = box.y + box.h + 6;
  const leftOut =
    meshesLeftOut === 0
      ? ''
      : meshesLeftOut === 1
        ? '; one uploaded mesh could not be read and is not drawn'
        : `; ${meshesLeftOut} uploaded meshes could not be read and are not drawn`;
  doc
    .fillColor('#666')
    .fontSize(7.5)
    .text(`Side view, long axis up (part z when there is no grip frame); dashed: removed material${leftOut}.`);
}

const teal = () => '#0f5c63';
