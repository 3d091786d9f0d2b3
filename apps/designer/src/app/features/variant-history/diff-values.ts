import { toDisplay } from '@tumblewise/engine';
import { formatFigure } from '../spin-report/report-figures';

const LENGTH_KEYS = new Set([
  'radius',
  'length',
  'innerRadius',
  'topRadius',
  'wall',
  'size',
  'semiAxes',
  'majorRadius',
  'minorRadius',
  'position',
  'point',
  'pivotDistance',
]);

/** The last named key of a path (`grip.point[1]` → `point`). */
function keyOf(path: string): string {
  const parts = path.replace(/\[\d+\]/g, '').split('.');
  return parts[parts.length - 1];
}

/** A document value from a diff written in display units (mm, g, kg/m³, rev/s, °); absent shows "—". */
export function showFieldValue(path: string, value: unknown): string {
  if (value === undefined || value === null) return '—';
  if (typeof value !== 'number')
    return typeof value === 'string' && value.startsWith('[') ? `${JSON.parse(value).length} entries` : String(value);
  const key = keyOf(path);
  if (path.startsWith('spin.rate')) return `${formatFigure(toDisplay(value, 'rate', 'rev/s'))} rev/s`;
  if (path.startsWith('spin.axis') || key === 'axis' || key === 'faceNormal') return formatFigure(value);
  if (LENGTH_KEYS.has(key)) return `${formatFigure(toDisplay(value, 'length', 'mm'))} mm`;
  if (key === 'mass') return `${formatFigure(toDisplay(value, 'mass', 'g'))} g`;
  if (key === 'density') return `${formatFigure(value)} kg/m³`;
  if (key === 'rotationDeg' || key === 'misalignmentDeg') return `${formatFigure(value)}°`;
  return formatFigure(value);
}
