import type { FieldFault } from '@tumblewise/ui';

/** A refused sweep as the page shows it: at a control of the form, or as a sentence naming the field. */
export interface SweepFaultView {
  /** Path of the form control the fault belongs to (`axes.1.steps`), when it is one of the form's. */
  control?: string;
  /** Message for the control (after its label), or the whole sentence for the page. */
  message: string;
}

const AXIS_FIELD = /^axes\[(\d)\](?:\.(from|to|steps|primitive|parameter))?$/;
const FIELD_WORDS: Record<string, string> = { from: 'From', to: 'To', steps: 'Steps', primitive: 'Parameter', parameter: 'Parameter' };

/** The message without its leading field path ("Axes[0].to must differ from from." → "must differ from from"). */
function rest(message: string, field: string): string {
  const trimmed = message.trim().replace(/\.$/, '');
  return trimmed.toLowerCase().startsWith(field.toLowerCase()) ? trimmed.slice(field.length).trim() : trimmed;
}

/**
 * Where a 400 of `POST /sweep` belongs. A field of an axis (`axes[1].to`) goes to that control with
 * the rest of the message; a field of the part (`part.primitives[2].radius`) is a problem of the
 * draft and is named with a pointer to the editor; any other field is named in the sentence.
 */
export function sweepFaultView(fault: FieldFault): SweepFaultView {
  const field = fault.field ?? '';
  const axis = AXIS_FIELD.exec(field);
  if (axis) {
    const which = FIELD_WORDS[axis[2] ?? 'parameter'];
    const control = `axes.${axis[1]}.${axis[2] === 'primitive' || !axis[2] ? 'parameter' : axis[2]}`;
    const said = rest(fault.message, field);
    return { control, message: /^[A-Z]/.test(said) ? `${which} of parameter ${Number(axis[1]) + 1}: ${said}.` : said };
  }
  if (field.startsWith('part.') || field === 'part') {
    const where = field.replace(/^part\.?/, '') || 'the document';
    return { message: `The draft cannot be mapped: ${where} ${rest(fault.message, field)}. Fix it in the part editor, then map again.` };
  }
  if (field === 'axes') return { message: `The parameters ${rest(fault.message, field)}.` };
  return { message: field ? `${fault.message} (field: ${field})` : fault.message };
}
