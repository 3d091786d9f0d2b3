import { analyzePart } from '@tumblewise/engine/worker';
import { partDrawing } from './part-outline';
import { spinReportPdf } from './spin-report-pdf';

const doc = { primitives: [{ id: 'shaft', shape: 'cylinder', radius: 0.012, length: 0.5, density: 700 }], spin: { axis: [0, 0, 1], rate: 10 } };

describe('the spin report PDF', () => {
  it('embeds DejaVu Sans, which writes ≥, − and λ (the built-in Helvetica cannot), and no built-in font', async () => {
    const pdf = await spinReportPdf({
      partName: 'Shaft', projectName: 'Checks', workspaceName: 'Kestrel Bay', number: 1, label: '', status: 'draft', author: null,
      createdAt: new Date('2026-12-02T00:00:00Z'), engineVersion: 'test', drawing: partDrawing(doc), report: analyzePart(doc),
    });
    const text = pdf.toString('latin1');
    expect(text.startsWith('%PDF-')).toBe(true);
    expect(text).toMatch(/\/BaseFont \/[A-Z]{6}\+DejaVuSans/); // a subset, tagged as PDF 32000-1 §9.6.4 says
    expect(text).toMatch(/\/FontFile2/);
    expect(text).not.toMatch(/\/BaseFont \/Helvetica/);
  });
});
