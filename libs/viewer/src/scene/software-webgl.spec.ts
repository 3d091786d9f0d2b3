import { isSoftwareWebGL, resetSoftwareWebGLProbe } from './software-webgl';

/** A canvas whose WebGL context names `renderer` (shaped like what browsers report, from memory). */
function stubWebGL(renderer: string | null): jest.SpyInstance {
  const gl =
    renderer === null
      ? null
      : {
          RENDERER: 0x1f01,
          getParameter: (p: number) => (p === 0x1f01 ? 'WebKit WebGL' : p === 0x9246 ? renderer : null),
          getExtension: (name: string) =>
            name === 'WEBGL_debug_renderer_info'
              ? { UNMASKED_RENDERER_WEBGL: 0x9246 }
              : name === 'WEBGL_lose_context'
                ? { loseContext: () => undefined }
                : null,
        };
  return jest.spyOn(HTMLCanvasElement.prototype, 'getContext').mockReturnValue(gl as never);
}

describe('isSoftwareWebGL', () => {
  afterEach(() => {
    jest.restoreAllMocks();
    resetSoftwareWebGLProbe();
  });

  it('recognises CPU renderers by the name the context reports', () => {
    stubWebGL('ANGLE (Vulkan 1.3.0 (SwiftShader Device (Subzero)), SwiftShader driver)');
    expect(isSoftwareWebGL()).toBe(true);
    resetSoftwareWebGLProbe();
    stubWebGL('llvmpipe (LLVM 15.0.6, 256 bits)');
    expect(isSoftwareWebGL()).toBe(true);
  });

  it('takes a GPU, or no WebGL at all, as not software', () => {
    stubWebGL('ANGLE (Direct3D11 vs_5_0 ps_5_0, discrete graphics card)');
    expect(isSoftwareWebGL()).toBe(false);
    resetSoftwareWebGLProbe();
    stubWebGL(null);
    expect(isSoftwareWebGL()).toBe(false);
  });

  it('probes once', () => {
    const spy = stubWebGL('SwiftShader');
    isSoftwareWebGL();
    isSoftwareWebGL();
    expect(spy).toHaveBeenCalledTimes(1);
  });
});
