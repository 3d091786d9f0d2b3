import PDFDocument from 'pdfkit';
import { analyzePart } from '@tumblewise/engine/worker';
import { partDrawing } from './part-outline';
import { spinReportPdf } from './spin-report-pdf';

const doc = {
  primitives: [{ id: 'shaft', shape: 'cylinder', radius: 0.012, length: 0.5, density: 700 }],
  spin: { axis: [0, 0, 1], rate: 10 },
};

describe('the spin report PDF', () => {
  it('embeds DejaVu Sans, which writes ≥, − and λ (the built-in Helvetica cannot), and no built-in font', async () => {
    const pdf = await spinReportPdf({
      partName: 'Shaft',
      projectName: 'Checks',
      workspaceName: 'Kestrel Bay',
      number: 1,
      label: '',
      status: 'draft',
      author: null,
      createdAt: new Date('2026-12-02T00:00:00Z'),
      engineVersion: 'test',
      drawing: partDrawing(doc),
      report: analyzePart(doc),
    });
    const text = pdf.toString('latin1');
    expect(text.startsWith('%PDF-')).toBe(true);
    expect(text).toMatch(/\/BaseFont \/[A-Z]{6}\+DejaVuSans/); // a subset, tagged as PDF 32000-1 §9.6.4 says
    expect(text).toMatch(/\/FontFile2/);
    expect(text).not.toMatch(/\/BaseFont \/Helvetica/);
  });

  it('keeps each figure beside its value when the tables run over a page', async () => {
    const report = analyzePart(doc);
    // Sixty check rows (with the engine's wording) so the table crosses at least one page end.
    const check = {
      id: 'c',
      title: 'Overall length of the implement, measured along its long axis',
      status: 'pass',
      rule: 'a rule of the governing body, value from memory',
      indicative: true,
    };
    const long = { ...report, checks: Array.from({ length: 60 }, (_, i) => ({ ...check, id: `c${i}` })) } as typeof report;
    const written: { text: string; x: number; y: number; page: unknown }[] = [];
    const original = PDFDocument.prototype.text;
    const spy = jest.spyOn(PDFDocument.prototype, 'text').mockImplementation(function (this: PDFKit.PDFDocument, ...args: unknown[]) {
      // Text placed at a position (the tables' figures and values): what, where, on which page.
      if (typeof args[0] === 'string' && typeof args[1] === 'number' && typeof args[2] === 'number')
        written.push({ text: args[0], x: args[1], y: args[2], page: this.page });
      return original.apply(this, args as never);
    });
    await spinReportPdf({
      partName: 'Shaft',
      projectName: 'Checks',
      workspaceName: 'Kestrel Bay',
      number: 1,
      label: '',
      status: 'draft',
      author: null,
      createdAt: new Date('2026-12-02T00:00:00Z'),
      engineVersion: 'test',
      drawing: partDrawing(doc),
      report: long,
    });
    spy.mockRestore();
    const keys = written.filter((w) => w.x === 48);
    const pages = new Set(written.map((w) => w.page));
    expect(pages.size).toBeGreaterThan(1);
    for (const key of keys) {
      const value = written[written.indexOf(key) + 1];
      expect(value).toMatchObject({ x: 290, y: key.y });
      expect(value.page).toBe(key.page);
    }
    expect(keys.filter((k) => k.text === check.title)).toHaveLength(60);
  });

  it('lists the axis the motion circles, its period and the flight time, and leaves them out of a report stored before them', async () => {
    const rowsOf = async (report: unknown) => {
      const written = new Map<string, string>();
      let lastKey: string | null = null;
      const original = PDFDocument.prototype.text;
      const spy = jest.spyOn(PDFDocument.prototype, 'text').mockImplementation(function (this: PDFKit.PDFDocument, ...args: unknown[]) {
        if (typeof args[0] === 'string' && args[1] === 48) lastKey = args[0];
        else if (typeof args[0] === 'string' && args[1] === 290 && lastKey !== null) written.set(lastKey, args[0]);
        return original.apply(this, args as never);
      });
      await spinReportPdf({
        partName: 'Shaft',
        projectName: 'Checks',
        workspaceName: 'Kestrel Bay',
        number: 1,
        label: '',
        status: 'draft',
        author: null,
        createdAt: new Date('2026-12-02T00:00:00Z'),
        engineVersion: 'test',
        drawing: partDrawing(doc),
        report: report as ReturnType<typeof analyzePart>,
      });
      spy.mockRestore();
      return written;
    };
    const report = analyzePart({ ...doc, category: 'javelin' });
    const rows = await rowsOf(report);
    expect(rows.get('Axis the motion circles')).toMatch(/^minor \(cone half-angle [\d.]+°\)$/);
    expect(rows.get('Period of the body-frame motion')).toMatch(/ s$/);
    expect(rows.get('Time in the air')).toBe('3.5 s (category default, a common practice estimate)');
    const { motionAxis: _a, coneHalfAngleDeg: _c, wobblePeriod: _w, flightTime: _f, flightTimeSource: _s, ...oldSpin } = report.spin;
    const old = await rowsOf({ ...report, spin: oldSpin });
    expect(old.has('Axis the motion circles')).toBe(false);
    expect(old.has('Time in the air')).toBe(false);
    expect(old.get('Wobble frequency')).toMatch(/rad\/s$/);
  });
});
