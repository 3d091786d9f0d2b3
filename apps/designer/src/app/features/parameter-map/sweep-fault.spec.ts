import { sweepFaultView } from './sweep-fault';

describe('sweepFaultView', () => {
  it('puts a refused axis setting at its control with the rest of the message', () => {
    expect(sweepFaultView({ field: 'axes[1].to', message: 'Axes[1].to must differ from from.' })).toEqual({
      control: 'axes.1.to',
      message: 'must differ from from',
    });
    expect(sweepFaultView({ field: 'axes[0].steps', message: 'Axes[0].steps must be at least 2.' })).toEqual({
      control: 'axes.0.steps',
      message: 'must be at least 2',
    });
  });

  it('puts a field the primitive lacks at the field select', () => {
    const view = sweepFaultView({
      field: 'axes[0].parameter',
      message: 'Axes[0].parameter does not apply: knob takes its density from material maple; free a dimension instead.',
    });
    expect(view.control).toBe('axes.0.parameter');
    expect(view.message).toBe('does not apply: knob takes its density from material maple; free a dimension instead');
  });

  it('names a problem of the draft by its path and points to the editor', () => {
    expect(sweepFaultView({ field: 'part.primitives[2].radius', message: 'Part.primitives[2].radius must be greater than zero.' })).toEqual(
      {
        message: 'The draft cannot be mapped: primitives[2].radius must be greater than zero. Fix it in the part editor, then map again.',
      },
    );
  });

  it('names any other field in the sentence', () => {
    expect(sweepFaultView({ field: 'axes', message: 'Axes must give at most 10000 points in all.' }).message).toBe(
      'The parameters must give at most 10000 points in all.',
    );
    expect(sweepFaultView({ field: 'figures[0]', message: 'Figures[0] is measured in the grip frame.' }).message).toBe(
      'Figures[0] is measured in the grip frame. (field: figures[0])',
    );
    expect(sweepFaultView({ message: 'The request body is not valid JSON.' })).toEqual({ message: 'The request body is not valid JSON.' });
  });
});
