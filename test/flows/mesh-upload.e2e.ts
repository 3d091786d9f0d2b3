import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { accessibilityViolations, baseUrl, openBrowser, screenshot } from '../support/browser';
import { api } from '../support/flow-helpers';

/**
 * An uploaded STL in the part editor: the demo designer adds a mesh primitive, uploads a file that is
 * not a closed solid and reads why it is refused, uploads a closed box, sees the spin report computed
 * from it and the box drawn in the 3-D view.
 *
 * The checks: the box's mass is ρ·a·b·c (volume of a rectangular prism, Machinery's Handbook,
 * "Volumes of solids"); spin about the long axis of a box whose other two sides differ is spin about
 * its minor principal axis, a steady spin for a rigid body (Euler's rigid-body equations; the
 * intermediate-axis rule, common practice).
 */
const stamp = Date.now().toString(36);
const designer = { email: 'designer@kestrelbay.test', password: 'kestrel-demo-2026' };
const projectName = `Mesh upload ${stamp}`;
/** The box (file in mm): a × b × c, with a density in kg/m³. */
const BOX = { a: 40, b: 30, c: 200, density: 650 };

const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]`);

type Tri = [number, number, number][];

/** The 12 outward triangles of the box [0, a] × [0, b] × [0, c] (counter-clockwise seen from outside). */
function boxTriangles(a: number, b: number, c: number): Tri[] {
  const v = (x: number, y: number, z: number): [number, number, number] => [x * a, y * b, z * c];
  const quads = [
    [v(0, 0, 0), v(0, 1, 0), v(1, 1, 0), v(1, 0, 0)],
    [v(0, 0, 1), v(1, 0, 1), v(1, 1, 1), v(0, 1, 1)],
    [v(0, 0, 0), v(1, 0, 0), v(1, 0, 1), v(0, 0, 1)],
    [v(0, 1, 0), v(0, 1, 1), v(1, 1, 1), v(1, 1, 0)],
    [v(0, 0, 0), v(0, 0, 1), v(0, 1, 1), v(0, 1, 0)],
    [v(1, 0, 0), v(1, 1, 0), v(1, 1, 1), v(1, 0, 1)],
  ];
  return quads.flatMap(
    ([p, q, r, s]) =>
      [
        [p, q, r],
        [p, r, s],
      ] as Tri[],
  );
}

/** A binary STL: 80-byte header, triangle count, then 50 bytes a triangle (normal, corners, attribute). */
function binaryStl(triangles: Tri[]): Buffer {
  const buf = Buffer.alloc(84 + 50 * triangles.length);
  buf.write('mesh upload flow', 0, 'ascii');
  buf.writeUInt32LE(triangles.length, 80);
  triangles.forEach((t, i) => t.forEach((p, k) => p.forEach((x, j) => buf.writeFloatLE(x, 84 + 50 * i + 12 + 12 * k + 4 * j))));
  return buf;
}

/** Screenshot, then axe on the whole page. */
async function expectAccessible(page: Page, screen: string): Promise<void> {
  await screenshot(page, screen);
  expect({ screen, violations: await accessibilityViolations(page) }).toEqual({ screen, violations: [] });
}

async function setField(page: Page, name: string, value: string): Promise<void> {
  const field = byTestId(page, `field-${name}`);
  await field.fill(value);
  await field.blur();
}

/** Picks `file` through the picker's "Upload STL…" button and the browser's file chooser. */
async function uploadThroughChooser(page: Page, file: string): Promise<void> {
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), byTestId(page, 'mesh-upload').click()]);
  await chooser.setFiles(file);
}

/** Share of the 3-D view's pixels that differ from its background colour (the drawing buffer is preserved). */
async function drawnShare(page: Page): Promise<number> {
  return page.evaluate(() => {
    const canvas = document.querySelector<HTMLCanvasElement>('[data-testid="viewer-canvas"]')!;
    const copy = document.createElement('canvas');
    copy.width = canvas.width;
    copy.height = canvas.height;
    const ctx = copy.getContext('2d')!;
    ctx.drawImage(canvas, 0, 0);
    const { data } = ctx.getImageData(0, 0, copy.width, copy.height);
    const [r0, g0, b0] = [data[0], data[1], data[2]];
    let differing = 0;
    for (let i = 0; i < data.length; i += 4) {
      if (Math.abs(data[i] - r0) + Math.abs(data[i + 1] - g0) + Math.abs(data[i + 2] - b0) > 24) differing++;
    }
    return differing / (data.length / 4);
  });
}

jest.setTimeout(180_000);

let browser: Awaited<ReturnType<typeof openBrowser>>;
let dir = '';
beforeAll(async () => {
  browser = await openBrowser();
  dir = mkdtempSync(path.join(os.tmpdir(), 'tw-mesh-flow-'));
});
afterAll(async () => {
  await browser?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

it('refuses an open STL with the reason at the field, then analyses and draws a closed box', async () => {
  const page = browser.page;
  const openFile = path.join(dir, 'open-box.stl');
  const boxFile = path.join(dir, 'box-40x30x200.stl');
  // The box without its top (two triangles left out): not a closed solid.
  writeFileSync(openFile, binaryStl(boxTriangles(BOX.a, BOX.b, BOX.c).filter((_, i) => i !== 2 && i !== 3)));
  writeFileSync(boxFile, binaryStl(boxTriangles(BOX.a, BOX.b, BOX.c)));

  await page.goto(`${baseUrl()}/signin`);
  await byTestId(page, 'signin-email').fill(designer.email);
  await byTestId(page, 'signin-password').fill(designer.password);
  await byTestId(page, 'signin-submit').click();
  await byTestId(page, 'project-table').waitFor();

  await byTestId(page, 'new-project').click();
  await byTestId(page, 'project-name').fill(projectName);
  await byTestId(page, 'project-category').click();
  await byTestId(page, 'category-other').click();
  await byTestId(page, 'project-create').click();
  await byTestId(page, 'project-link').filter({ hasText: projectName }).click();
  await byTestId(page, 'empty-new-part').click();
  await byTestId(page, 'part-name').fill('Scanned block');
  await byTestId(page, 'part-create').click();
  await byTestId(page, 'primitives-empty').waitFor();

  await byTestId(page, 'add-mesh').click();
  await byTestId(page, 'mesh-picker').waitFor();
  await expect(byTestId(page, 'mesh-picker').innerText()).resolves.toMatch(/0\.001 if the file is in mm/);
  await expect(byTestId(page, 'field-scale').inputValue()).resolves.toBe('0.001');
  await setField(page, 'density', String(BOX.density));
  // Spin about z, the box's long side.
  await setField(page, 'spinAxis_0', '0');
  await setField(page, 'spinAxis_1', '0');
  await setField(page, 'spinAxis_2', '1');
  await screenshot(page, 'mesh-01-primitive-added');

  // An open mesh: refused, the reason at the field, nothing selected.
  // Before any file the field asks for a mesh; after the upload it says why the file was refused.
  await expect(byTestId(page, 'mesh-error').innerText()).resolves.toMatch(/Choose an uploaded mesh or upload an STL file/);
  await uploadThroughChooser(page, openFile);
  await byTestId(page, 'mesh-error').filter({ hasText: 'The STL cannot be used' }).waitFor();
  await expect(byTestId(page, 'mesh-error').innerText()).resolves.toMatch(/The STL cannot be used: .*not closed/);
  await expect(byTestId(page, 'field-meshId').innerText()).resolves.not.toMatch(/open-box/);
  await expectAccessible(page, 'mesh-02-open-file-refused');

  // The closed box: uploaded, checked, selected, analysed.
  await uploadThroughChooser(page, boxFile);
  await byTestId(page, 'mesh-error').waitFor({ state: 'detached' });
  await screenshot(page, 'mesh-03-box-selected');
  await expect(byTestId(page, 'field-meshId').innerText()).resolves.toMatch(/box-40x30x200 · 12 triangles · 684 B/);
  await page.locator('[data-testid="report-verdict"][data-verdict="steady"]').waitFor();
  await byTestId(page, 'report-loading').waitFor({ state: 'detached' });
  await expect(byTestId(page, 'report-verdict').innerText()).resolves.toMatch(/minor/);

  // m = ρ·a·b·c (Machinery's Handbook, volume of a rectangular prism): 650 kg/m³ × 0.04 × 0.03 × 0.2 m³ = 156 g.
  const expectedGrams = BOX.density * (BOX.a / 1000) * (BOX.b / 1000) * (BOX.c / 1000) * 1000;
  const massText = await byTestId(page, 'report-mass').innerText();
  const [, value, unit] = /([\d.,]+)\s*(g|kg)/.exec(massText) ?? [];
  const grams = Number(value.replace(/,/g, '')) * (unit === 'kg' ? 1000 : 1);
  expect(Math.abs(grams - expectedGrams) / expectedGrams).toBeLessThan(0.005);

  // The 3-D view fetches the stored file and draws it: the viewer counts it, and the picture holds
  // far more than the axis rods (measured here: rods alone ≈ 1 % of the pixels, with the box ≈ 6 %).
  const viewer = page.locator('tw-part-viewer[data-meshes-drawn="1"]');
  await byTestId(page, 'viewer-slot').scrollIntoViewIfNeeded();
  await viewer.waitFor();
  await expect(viewer.getAttribute('data-meshes-failed')).resolves.toBe('0');
  await page.waitForTimeout(300);
  expect(await drawnShare(page)).toBeGreaterThan(0.03);
  // The file was read for drawing on the mesh-drawing worker, off the page's main thread.
  expect(page.workers().map((w) => w.url())).toEqual(expect.arrayContaining([expect.stringMatching(/\/worker-[A-Z0-9]+\.js$/)]));
  await expectAccessible(page, 'mesh-04-box-analysed-and-drawn');
});

it('keeps the upload this primitive uses and deletes one nothing uses, after a confirmation', async () => {
  const page = browser.page;
  const copyFile = path.join(dir, 'box-copy.stl');
  writeFileSync(copyFile, binaryStl(boxTriangles(BOX.a, BOX.b, BOX.c)));
  await uploadThroughChooser(page, copyFile);
  await byTestId(page, 'field-meshId').filter({ hasText: 'box-copy' }).waitFor();

  await byTestId(page, 'mesh-manage').locator('summary').click();
  const row = (name: string) => byTestId(page, 'mesh-upload-row').filter({ hasText: name });
  await expect(byTestId(page, 'mesh-upload-row').count()).resolves.toBe(2);
  await row('box-copy').locator('[data-testid="mesh-delete"]').click();
  await expect(byTestId(page, 'mesh-delete-note').innerText()).resolves.toMatch(/“box-copy” is the mesh of this primitive/);

  // The first box is free once the draft holding the new choice is saved (autosave).
  const session = await api<{ accessToken: string; memberships: { workspace: { id: string } }[] }>('/auth/signin', null, {
    body: designer,
  });
  const workspaceId = session.memberships[0].workspace.id;
  const meshes = await api<{ id: string; name: string }[]>(`/workspaces/${workspaceId}/meshes`, session.accessToken);
  const first = meshes.find((m) => m.name === 'box-40x30x200');
  expect(first).toBeDefined();
  const deadline = Date.now() + 15_000;
  for (;;) {
    const usage = await api<{ parts: unknown[] }>(`/workspaces/${workspaceId}/meshes/${first!.id}/usage`, session.accessToken);
    if (usage.parts.length === 0) break;
    if (Date.now() > deadline) throw new Error('the draft still uses the first box after 15 s');
    await page.waitForTimeout(200);
  }
  await row('box-40x30x200').locator('[data-testid="mesh-delete"]').click();
  const dialog = page.getByRole('dialog');
  await expect(dialog.innerText()).resolves.toMatch(/Delete the mesh “box-40x30x200”\?/);
  await expectAccessible(page, 'mesh-05-delete-confirmation');
  await byTestId(page, 'confirm-accept').click();
  await byTestId(page, 'mesh-delete-note').filter({ hasText: 'Deleted the mesh “box-40x30x200”.' }).waitFor();
  // The note shows as the delete is answered; the list follows when it has been fetched again.
  await row('box-40x30x200').waitFor({ state: 'detached' });
  await expect(byTestId(page, 'mesh-upload-row').count()).resolves.toBe(1);
  await expect(byTestId(page, 'field-meshId').innerText()).resolves.toMatch(/box-copy/);
  const after = await api<{ id: string }[]>(`/workspaces/${workspaceId}/meshes`, session.accessToken);
  expect(after.some((m) => m.id === first!.id)).toBe(false);
  await expectAccessible(page, 'mesh-06-upload-deleted');
});

it('shows how much of a slow upload is sent', async () => {
  const page = browser.page;
  // 2000 boxes side by side (24 000 triangles, 1.2 MB), sent at 0.4 MB/s: about three seconds of upload.
  const boxes = Array.from({ length: 2000 }, (_, k) =>
    boxTriangles(BOX.a, BOX.b, BOX.c).map((t) => t.map(([x, y, z]) => [x + (k % 50) * 50, y + Math.floor(k / 50) * 40, z]) as Tri),
  ).flat();
  const bigFile = path.join(dir, 'box-rack.stl');
  writeFileSync(bigFile, binaryStl(boxes));
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: 400_000 });
  try {
    await uploadThroughChooser(page, bigFile);
    await byTestId(page, 'mesh-progress')
      .filter({ hasText: /Uploading box-rack\.stl… \d+ %/ })
      .waitFor();
    await screenshot(page, 'mesh-07-upload-progress');
  } finally {
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
  }
  await byTestId(page, 'field-meshId').filter({ hasText: 'box-rack' }).waitFor({ timeout: 30_000 });
});
