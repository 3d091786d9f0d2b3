import type { ApiError, MeshUploadEvent } from '@tumblewise/api-client';
import type { Mesh } from '@tumblewise/shared';

/**
 * A file size for people: bytes below 1 kB, else kB or MB with decimal prefixes (1 kB = 1000 B,
 * IEC 80000-13), three significant digits.
 */
export function formatBytes(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return '';
  if (bytes < 1000) return `${Math.round(bytes)} B`;
  const [value, unit] = bytes < 1e6 ? [bytes / 1e3, 'kB'] : [bytes / 1e6, 'MB'];
  return `${Number(value.toPrecision(3))} ${unit}`;
}

/** "12 triangles" / "1 triangle", with thousands separated. */
export function triangleText(count: number): string {
  return `${count.toLocaleString('en-GB')} ${count === 1 ? 'triangle' : 'triangles'}`;
}

/** How a mesh reads in the picker: its name, triangle count and file size. */
export function meshOptionLabel(mesh: Pick<Mesh, 'name' | 'triangleCount' | 'byteSize'>): string {
  return `${mesh.name} · ${triangleText(mesh.triangleCount)} · ${formatBytes(mesh.byteSize)}`;
}

/** What the upload line says, and the progress bar's value (null: indeterminate). */
export interface UploadProgressView {
  text: string;
  /** Per cent sent, or null when the transport does not say or the server is checking. */
  percent: number | null;
}

/** The progress line for an upload event (not for `done`, which ends the upload). */
export function uploadProgressView(event: Exclude<MeshUploadEvent, { kind: 'done' }>, fileName: string): UploadProgressView {
  if (event.kind === 'checking') return { text: `Checking the mesh in ${fileName}…`, percent: null };
  if (event.fraction === null) return { text: `Uploading and checking ${fileName}…`, percent: null };
  const percent = Math.min(100, Math.max(0, Math.round(event.fraction * 100)));
  return { text: `Uploading ${fileName}… ${percent} %`, percent };
}

/**
 * The message shown at the field when an upload fails: the server's own words for a refused file
 * (they say what is wrong with it), a plain sentence otherwise.
 */
export function uploadFailureMessage(error: Pick<ApiError, 'status' | 'message'>): string {
  if (error.status === 0) return 'The upload did not reach the server. Check your connection and try again.';
  if (error.status >= 400 && error.status < 500) return error.message;
  return `The upload failed on the server (${error.status}); nothing was stored. Try again later.`;
}

/** A file the picker offers to upload: refuses what is clearly not an STL before sending it. */
export function fileProblem(file: Pick<File, 'name' | 'size'>): string | null {
  if (!/\.stl$/i.test(file.name)) return `“${file.name}” is not an .stl file: choose an STL (binary or ASCII).`;
  if (file.size === 0) return `“${file.name}” is empty.`;
  return null;
}

/** A display name for a new upload: the file name without its .stl ending, at most 200 characters. */
export function uploadName(fileName: string): string {
  const base = fileName.replace(/\.stl$/i, '').trim();
  return (base || fileName).slice(0, 200);
}

/**
 * A document problem with a mesh primitive's `meshId`, worded for the picker: a missing reference
 * asks for a choice or an upload (inline triangles come only from an imported file).
 */
export function meshReferenceProblem(message: string | null): string | null {
  if (!message) return null;
  if (/^is required/.test(message)) return 'Choose an uploaded mesh or upload an STL file.';
  return `Mesh ${message}`;
}
