import {
  fileProblem,
  meshReferenceProblem,
  formatBytes,
  meshOptionLabel,
  triangleText,
  uploadFailureMessage,
  uploadName,
  uploadProgressView,
} from './mesh-picker-model';

describe('the mesh picker model', () => {
  it('writes file sizes with decimal prefixes (IEC 80000-13: 1 kB = 1000 B, 1 MB = 10⁶ B)', () => {
    expect(formatBytes(684)).toBe('684 B');
    expect(formatBytes(999)).toBe('999 B');
    expect(formatBytes(1000)).toBe('1 kB');
    expect(formatBytes(12_345)).toBe('12.3 kB');
    expect(formatBytes(50_000_084)).toBe('50 MB');
    expect(formatBytes(-1)).toBe('');
  });

  it('labels a mesh by name, triangle count and size', () => {
    expect(meshOptionLabel({ name: 'grip-scan', triangleCount: 12_800, byteSize: 640_084 })).toBe('grip-scan · 12,800 triangles · 640 kB');
    expect(triangleText(1)).toBe('1 triangle');
  });

  it('says what the upload is doing', () => {
    expect(uploadProgressView({ kind: 'uploading', fraction: 0.404 }, 'head.stl')).toEqual({
      text: 'Uploading head.stl… 40 %',
      percent: 40,
    });
    expect(uploadProgressView({ kind: 'uploading', fraction: null }, 'head.stl')).toEqual({
      text: 'Uploading and checking head.stl…',
      percent: null,
    });
    expect(uploadProgressView({ kind: 'checking' }, 'head.stl')).toEqual({ text: 'Checking the mesh in head.stl…', percent: null });
  });

  it('shows the server’s reason for a refused file, and a plain sentence otherwise', () => {
    const refusal = 'The STL cannot be used: the mesh is not closed: 4 edges belong to only one triangle.';
    expect(uploadFailureMessage({ status: 422, message: refusal })).toBe(refusal);
    expect(uploadFailureMessage({ status: 413, message: 'The STL cannot be used: too large.' })).toMatch(/too large/);
    expect(uploadFailureMessage({ status: 0, message: 'x' })).toMatch(/did not reach the server/);
    expect(uploadFailureMessage({ status: 500, message: 'x' })).toMatch(/nothing was stored/);
  });

  it('refuses a file that is clearly not an STL before sending it', () => {
    expect(fileProblem({ name: 'head.STL', size: 684 })).toBeNull();
    expect(fileProblem({ name: 'head.obj', size: 684 })).toMatch(/not an \.stl file/);
    expect(fileProblem({ name: 'head.stl', size: 0 })).toMatch(/empty/);
  });

  it('names an upload after its file', () => {
    expect(uploadName('club-head v2.stl')).toBe('club-head v2');
    expect(uploadName('.stl')).toBe('.stl');
    expect(uploadName(`${'x'.repeat(300)}.stl`)).toHaveLength(200);
  });

  it('words a missing or unknown mesh reference for the picker', () => {
    expect(meshReferenceProblem('is required (or give inline vertices and triangles)')).toBe(
      'Choose an uploaded mesh or upload an STL file.',
    );
    expect(meshReferenceProblem('is not a known mesh (m-9)')).toBe('Mesh is not a known mesh (m-9)');
    expect(meshReferenceProblem(null)).toBeNull();
  });
});
