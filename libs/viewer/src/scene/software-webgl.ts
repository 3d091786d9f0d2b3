/** Renderer names of WebGL implementations that draw on the CPU. */
const SOFTWARE_RENDERERS = /swiftshader|llvmpipe|softpipe|software|basic render driver/i;

let probed: boolean | null = null;

/**
 * Whether this browser's WebGL draws on the CPU (no usable GPU: SwiftShader, llvmpipe …), probed
 * once on a throwaway canvas. There, 4× multisampling makes every drawing about three times as
 * costly (measured in a Chromium trace of the part editor: 945 → 329 ms of WebGL work for six
 * keystrokes), and the browser waits for the drawing on the page's main thread.
 */
export function isSoftwareWebGL(): boolean {
  if (probed !== null) return probed;
  probed = false;
  try {
    const canvas = document.createElement('canvas');
    const gl = (canvas.getContext('webgl2') ?? canvas.getContext('webgl')) as WebGLRenderingContext | null;
    if (!gl) return probed;
    const debug = gl.getExtension('WEBGL_debug_renderer_info');
    const names = [String(gl.getParameter(gl.RENDERER) ?? ''), debug ? String(gl.getParameter(debug.UNMASKED_RENDERER_WEBGL) ?? '') : ''];
    probed = names.some((name) => SOFTWARE_RENDERERS.test(name));
    gl.getExtension('WEBGL_lose_context')?.loseContext();
  } catch {
    probed = false;
  }
  return probed;
}

/** Forgets the probe (tests). */
export function resetSoftwareWebGLProbe(): void {
  probed = null;
}
