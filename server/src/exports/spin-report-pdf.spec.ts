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
});
