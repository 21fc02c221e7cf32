import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import type { Page } from '@playwright/test';
import { expect, expectAccessible, screenshot, signIn, signOut, test } from '../support/fixtures';
import { onePagePdf, tinyPng } from '../support/files';
import { linkIn, waitForMail } from '../support/mailbox';
import { Api } from '../support/people';

/**
 * The journeys of the web issue, in order, on one project: a designer
 * creates a project and a door plate, sees the result change live as the
 * thickness changes, saves and submits; cannot countersign it; a checker
 * countersigns it from the queue; a fabricator sees the issued revision and
 * not the drafts, and downloads its sheet; the public verify page tells the
 * sheet's code matches, then that it is superseded. Each main screen is
 * photographed and checked with axe.
 */
test.describe.configure({ mode: 'serial' });

const run = Date.now().toString(36).toUpperCase();
const projectNumber = `J-${run}`;
let projectPath = '';
let doorPath = '';

// The attachments of the door: a drawing (PDF, padded so that its upload takes a moment on a
// throttled connection and the progress bar can be seen moving) and a photo (PNG).
const drawing = { name: 'door-drawing-D-1.pdf', buffer: onePagePdf('Cabinet door D-1', 400_000) };
const photo = { name: 'seal-photo.png', buffer: tinyPng(32) };
const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

/** Drops files on an element the way a browser does: a drop event carrying a DataTransfer. */
async function dropFiles(
  page: Page,
  selector: string,
  files: { name: string; mimeType: string; buffer: Buffer }[],
): Promise<void> {
  const dataTransfer = await page.evaluateHandle(
    (list) => {
      const dt = new DataTransfer();
      for (const f of list) {
        const bytes = Uint8Array.from(atob(f.base64), (c) => c.charCodeAt(0));
        dt.items.add(new File([bytes], f.name, { type: f.mimeType }));
      }
      return dt;
    },
    files.map((f) => ({ name: f.name, mimeType: f.mimeType, base64: f.buffer.toString('base64') })),
  );
  await page.locator(selector).dispatchEvent('dragenter', { dataTransfer });
  await page.locator(selector).dispatchEvent('drop', { dataTransfer });
}

test('a designer creates a project and a door plate, sees results change live, saves and submits', async ({
  page,
  cast,
}) => {
  await page.goto('/projects');
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fprojects/);
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  await expectAccessible(page, 'sign-in');
  await screenshot(page, 'sign-in');
  await signIn(page, cast.designer);

  await expect(page.getByRole('heading', { name: 'Projects' })).toBeVisible();
  await page.getByRole('link', { name: 'New project' }).click();
  await page.getByLabel('Project number').fill(projectNumber);
  await page.getByLabel('Project name').fill('Journey drying cabinet');
  await page.getByLabel('Client').fill('Larchmont Applied Materials Lab');
  await page.getByLabel('Ambient pressure from').selectOption('altitude');
  await page.getByLabel('Site altitude').fill('350 m');
  await expectAccessible(page, 'new project');
  await screenshot(page, 'project-new');
  await page.getByRole('button', { name: 'Create project' }).click();

  await expect(
    page.getByRole('heading', { name: `${projectNumber} Journey drying cabinet` }),
  ).toBeVisible();
  projectPath = new URL(page.url()).pathname;
  // The designer adds the other two by their e-mail addresses (GET /users/lookup behind the form).
  await page.goto(`${projectPath}/members`);
  await expect(page.getByRole('heading', { name: 'Members' })).toBeVisible();
  const addMember = async (email: string, role: string) => {
    await page.getByLabel('E-mail address').fill(email);
    await page.getByLabel('Role', { exact: true }).selectOption({ label: role });
    await page.getByRole('button', { name: 'Add member' }).click();
    await expect(page.getByRole('status').filter({ hasText: `added as ${role}` })).toBeVisible();
  };
  await addMember(cast.checker.email, 'Checker');
  await addMember(cast.fabricator.email, 'Fabricator');
  const membersTable = page.getByRole('table', { name: 'Project members' });
  await expect(membersTable).toContainText(cast.checker.name);
  await expect(membersTable).toContainText(cast.fabricator.name);
  await page.getByLabel('E-mail address').fill(`nobody-${run.toLowerCase()}@journeys.example`);
  await page.getByRole('button', { name: 'Add member' }).click();
  await expect(page.getByLabel('E-mail address')).toHaveAccessibleDescription(
    /No active Hoopline account has this address/,
  );
  await expectAccessible(page, 'members');
  await screenshot(page, 'members');
  await page.goto(projectPath);

  await page.getByRole('link', { name: 'New component' }).click();
  await page.getByLabel('Circular flat plate').click();
  await expect(page.getByText('Kind: Circular flat plate')).toBeVisible();
  await page.getByLabel('Component name').fill('Cabinet door plate');
  await page.getByLabel('Tag (optional)').fill('D-1');

  const summary = page.getByText(/^Governing:/);
  const verdict = page
    .getByRole('region', { name: 'Results' })
    .getByText(/^(Passes|Fails|Outside validity|No checks)$/)
    .first();
  await expect(summary).toBeVisible();
  await expect(verdict).toHaveText('Passes');
  const at12 = await summary.textContent();

  const thickness = page.getByLabel('Thickness', { exact: true });
  await thickness.fill('4 mm');
  // Recomputed in the browser on the keystroke, no server round trip: a 4 mm plate fails.
  await expect(verdict).toHaveText('Fails');
  await expect(summary).not.toHaveText(at12 ?? '');
  await expect(thickness).toHaveAccessibleDescription(/Reads as 0\.004 m/);

  // A thickness the engine cannot read: the old verdict is not left on screen under the
  // banner (dimmed or not); "No verdict" stands in for it until the inputs read again.
  await thickness.fill('10 furlongs');
  const results = page.getByRole('region', { name: 'Results' });
  await expect(
    results.getByRole('alert').filter({ hasText: /^Not current: these results are for the last/ }),
  ).toBeVisible();
  await expect(results.getByText('No verdict: inputs not readable')).toBeVisible();
  await expect(results.getByText(/^(Passes|Fails|Pass|Fail|No checks)$/)).toHaveCount(0);
  // "Outside validity" only as the warnings' own label, not as a verdict.
  await expect(results.getByText(/^Outside validity$/)).toHaveCount(
    await results
      .getByRole('region', { name: 'Validity warnings' })
      .getByText(/^Outside validity$/)
      .count(),
  );
  await expect(results.getByRole('meter').first()).toHaveAttribute(
    'aria-valuetext',
    /, not current$/,
  );
  await expect(page.getByRole('button', { name: 'Save as revision 1' })).toBeDisabled();
  await screenshot(page, 'component-editor-not-current');

  await thickness.fill('10 mm');
  await expect(verdict).toHaveText('Passes');
  const at10 = await summary.textContent();
  // At a design temperature the 304 plate is derated (ASME II-D tables): a higher utilisation,
  // the trail's temperature step and the design-temperature caution; cleared, room temperature again.
  const temperature = page.getByLabel('Design temperature (optional)');
  await temperature.fill('300 degC');
  await expect(summary).not.toHaveText(at10 ?? '');
  await expect(page.getByText('Properties at the design temperature').first()).toBeVisible();
  await temperature.fill('');
  await expect(summary).toHaveText(at10 ?? '');
  await expect(page.getByRole('complementary', { name: 'Screening caution' })).toContainText(
    'Screening only — not a code calculation',
  );
  await expect(page.getByRole('img', { name: /Utilisation against thickness/ })).toBeVisible();
  await expect(page.getByRole('img', { name: /Section of a flat circular plate/ })).toBeVisible();
  await expectAccessible(page, 'component editor');
  await screenshot(page, 'component-editor');
  // The dark theme follows the system preference while the choice is "System".
  await page.emulateMedia({ colorScheme: 'dark' });
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'dark');
  await expectAccessible(page, 'component editor, dark theme');
  await screenshot(page, 'component-editor-dark');
  await page.emulateMedia({ colorScheme: 'light' });
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'light');
  // US customary display, stored on the user (PATCH /api/me); the inputs stay as typed.
  await page.getByRole('radio', { name: 'US' }).check({ force: true });
  await expect(thickness).toHaveAccessibleDescription(/Reads as 0\.3937 in = 0\.01 m/);
  await expect(page.getByRole('table', { name: /Checks for/ })).toContainText('ksi');
  await expect(thickness).toHaveValue('10 mm');
  await page.getByRole('radio', { name: 'SI' }).check({ force: true });
  await expect(page.getByRole('table', { name: /Checks for/ })).toContainText('MPa');

  await page.getByRole('button', { name: 'Save as revision 1' }).click();
  await expect(page.getByText('Revision 1 as saved, computed by the server')).toBeVisible();
  doorPath = new URL(page.url()).pathname;

  // Attachments: the drawing through the file picker on a throttled connection (the bar moves),
  // the photo dropped on the control; a file of another type is refused on the control.
  const attachments = page.getByRole('region', { name: 'Attachments', exact: true });
  await expect(attachments).toContainText('Nothing is attached to this component.');
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', {
    offline: false,
    latency: 0,
    downloadThroughput: -1,
    uploadThroughput: 160 * 1024,
  });
  await attachments
    .getByLabel('Choose files')
    .setInputFiles({ name: drawing.name, mimeType: 'application/pdf', buffer: drawing.buffer });
  const bar = attachments.getByRole('progressbar', { name: `Upload of ${drawing.name}` });
  await expect
    .poll(async () => Number(await bar.getAttribute('aria-valuenow')), { timeout: 10_000 })
    .toBeGreaterThan(0);
  const midway = Number(await bar.getAttribute('aria-valuenow'));
  expect(midway).toBeLessThan(100);
  await screenshot(page, 'attachment-uploading');
  await expect(bar).toHaveAttribute('aria-valuetext', 'Uploaded', { timeout: 20_000 });
  await cdp.send('Network.emulateNetworkConditions', {
    offline: false,
    latency: 0,
    downloadThroughput: -1,
    uploadThroughput: -1,
  });
  await cdp.detach();
  await dropFiles(page, '[data-testid="drop-zone"]', [
    { name: photo.name, mimeType: 'image/png', buffer: photo.buffer },
  ]);
  await expect(
    attachments.getByRole('progressbar', { name: `Upload of ${photo.name}` }),
  ).toHaveAttribute('aria-valuetext', 'Uploaded');
  const table = attachments.getByRole('table', { name: 'Attachments of Cabinet door plate' });
  await expect(table.getByRole('row', { name: new RegExp(drawing.name) })).toContainText(
    'PDF document',
  );
  const thumbnail = table.getByRole('img', { name: `Preview of ${photo.name}` });
  await expect(thumbnail).toBeVisible();
  // The thumbnail loads lazily (loading="lazy"): only once it is near the viewport, as a person scrolls to it.
  await thumbnail.scrollIntoViewIfNeeded();
  await expect
    .poll(() => thumbnail.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth))
    .toBe(32);
  await expect(table.getByTitle(sha256(photo.buffer))).toBeAttached();
  await attachments.getByLabel('Choose files').setInputFiles({
    name: 'notes.txt',
    mimeType: 'text/plain',
    buffer: Buffer.from('not a drawing'),
  });
  await expect(attachments.getByRole('alert')).toContainText(
    'notes.txt was not uploaded. Not an accepted type',
  );
  await expect(attachments.getByLabel('Choose files')).toHaveAttribute('aria-invalid', 'true');
  await expect(table.getByRole('row')).toHaveCount(3); // header and the two accepted files
  await expectAccessible(page, 'component attachments');
  await screenshot(page, 'component-attachments');

  await page.getByRole('button', { name: 'Submit revision 1 for check' }).click();
  await expect(page.getByText('Awaiting check').first()).toBeVisible();
  await expect(page.getByText(/Revision 1 is awaiting check/)).toBeVisible();
  await screenshot(page, 'component-submitted');

  // A second component left as a draft: the fabricator must never see it.
  await page.goto(`${projectPath}/components/new`);
  await page.getByLabel('Flat-area load and fasteners').click();
  await page.getByLabel('Component name').fill('Door latches (draft)');
  await page.getByRole('button', { name: 'Save as revision 1' }).click();
  await expect(page.getByText('Revision 1 as saved, computed by the server')).toBeVisible();

  await page.goto(projectPath);
  await expect(page.getByRole('link', { name: 'Cabinet door plate' })).toBeVisible();
  await expectAccessible(page, 'project');
  await screenshot(page, 'project');
  await page.goto('/projects');
  await expect(page.getByRole('link', { name: projectNumber })).toBeVisible();
  await expectAccessible(page, 'projects');
  await screenshot(page, 'projects');
});

test('the designer cannot countersign their own revision, and is told why', async ({
  page,
  cast,
}) => {
  await page.goto(doorPath);
  await signIn(page, cast.designer);
  await page.getByRole('link', { name: 'Revisions' }).click();
  await page.getByRole('link', { name: '1', exact: true }).click();
  const countersign = page.getByRole('button', { name: 'Countersign' });
  await expect(countersign).toBeDisabled();
  await expect(
    page.getByText(/You authored this revision, so you cannot countersign or return it/),
  ).toBeVisible();
  await expect(page.getByRole('button', { name: 'Return to designer' })).toBeDisabled();
  // Not countersigned yet: the designer may preview the sheet, stamped DRAFT by the server.
  const [draft] = await Promise.all([
    page.waitForResponse((r) => r.url().includes('/sheet.pdf')),
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Preview draft sheet' }).click(),
  ]);
  expect(draft.status()).toBe(200);
  expect(draft.headers()['x-hoopline-stamp']).toBe('draft');
  await expect(page.getByRole('button', { name: 'Download sheet' })).toHaveCount(0);
  await expectAccessible(page, 'own revision');
  await screenshot(page, 'revision-own');
  await signOut(page);
});

test('a checker follows a deep link, then countersigns from the queue, which updates without a reload', async ({
  page,
  cast,
}) => {
  await page.goto(doorPath);
  await expect(page).toHaveURL(/\/sign-in\?next=/);
  await signIn(page, cast.checker);
  // Back where the link pointed.
  await expect(page).toHaveURL(new RegExp(`${doorPath}$`));
  await expect(page.getByRole('heading', { name: /Cabinet door plate/ })).toBeVisible();

  await page.getByRole('link', { name: /Check queue/ }).click();
  const row = page.getByRole('row', { name: /Cabinet door plate · revision 1/ });
  await expect(row).toBeVisible();
  await expectAccessible(page, 'check queue');
  await screenshot(page, 'check-queue');

  await row.getByRole('link', { name: /Cabinet door plate · revision 1/ }).click();
  await expect(page.getByRole('table', { name: 'Calculation trail' })).toBeVisible();
  const attached = page.getByRole('region', { name: 'Attachments', exact: true });
  // Names and full hashes, as the sheet lists them.
  await expect(attached.getByRole('list', { name: 'Attached files' })).toContainText(drawing.name);
  await expect(attached).toContainText(sha256(drawing.buffer));
  await expect(attached).toContainText(photo.name);
  await expect(attached).toContainText(sha256(photo.buffer));
  await expect(attached.getByRole('img', { name: `Preview of ${photo.name}` })).toBeVisible();
  await page
    .getByLabel('Comment')
    .fill('Trail read line by line; stress and deflection agree with Roark 11.2.');
  await expectAccessible(page, 'review');
  await screenshot(page, 'review');
  // Readable on a tablet.
  await page.setViewportSize({ width: 820, height: 1180 });
  await expectAccessible(page, 'review on a tablet');
  await screenshot(page, 'review-tablet');
  await page.setViewportSize({ width: 1280, height: 720 });
  await page.getByRole('button', { name: 'Countersign' }).click();
  // The confirmation dialog (issue 16.2; its own journey is sign-off.spec.ts).
  await page.getByRole('dialog').getByRole('button', { name: 'Countersign revision' }).click();
  await expect(
    page.getByRole('heading', { name: /Revision 1 of Cabinet door plate.* countersigned/ }),
  ).toBeVisible();

  await page
    .getByRole('link', { name: /Check queue/ })
    .first()
    .click();
  await expect(page.getByRole('heading', { name: 'Check queue' })).toBeVisible();
  await expect(page.getByRole('row', { name: /Cabinet door plate · revision 1/ })).toHaveCount(0);
  await signOut(page);
});

test('a fabricator sees the issued revision and not the drafts', async ({ page, cast }) => {
  await page.goto('/issued');
  await signIn(page, cast.fabricator);
  await expect(page.getByRole('heading', { name: 'Issued' })).toBeVisible();
  const issued = page.getByRole('row', { name: /Cabinet door plate/ });
  await expect(issued).toBeVisible();
  await expect(issued.getByText('Passes', { exact: true })).toBeVisible();
  await expect(page.getByText('Door latches (draft)')).toHaveCount(0);
  await expectAccessible(page, 'issued');
  await screenshot(page, 'issued');
  // The stamped-for-review sheet, A4 chosen, saved under the server's name.
  await issued.getByLabel(/Paper size/).selectOption('a4');
  const [sheet, download] = await Promise.all([
    page.waitForResponse((r) => r.url().includes('/sheet.pdf')),
    page.waitForEvent('download'),
    issued.getByRole('button', { name: /Download sheet/ }).click(),
  ]);
  expect(sheet.status()).toBe(200);
  expect(new URL(sheet.url()).searchParams.get('paper')).toBe('a4');
  expect(sheet.headers()['content-type']).toBe('application/pdf');
  expect(sheet.headers()['x-hoopline-stamp']).toBe('review');
  expect(Number(sheet.headers()['content-length'])).toBeGreaterThan(1000);
  // What the fabricator's browser saved: the bytes of the Blob the app got through its client.
  const pdf = await readFile(await download.path());
  expect(pdf.length).toBe(Number(sheet.headers()['content-length']));
  expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  expect(download.suggestedFilename()).toBe(`${projectNumber}_Cabinet-door-plate_rev1.pdf`);

  await page.goto(projectPath);
  await expect(page.getByRole('link', { name: 'Cabinet door plate' })).toBeVisible();
  await expect(page.getByText('Door latches (draft)')).toHaveCount(0);
  await page.getByRole('link', { name: 'Cabinet door plate' }).click();
  await expect(page.getByText('Countersigned').first()).toBeVisible();
  await expect(page.getByRole('button', { name: /Save as revision/ })).toHaveCount(0);
  // The attachments of an issued component, and its sheet; never a draft preview.
  await expect(page.getByRole('region', { name: 'Attachments', exact: true })).toContainText(
    drawing.name,
  );
  await expect(page.getByRole('button', { name: 'Download sheet' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Preview draft sheet' })).toHaveCount(0);
  await expectAccessible(page, 'fabricator revision');
  await screenshot(page, 'fabricator-revision');
  await signOut(page);
});

test('the public verify page says the sheet matches, then that a later countersign superseded it', async ({
  page,
  cast,
}) => {
  const componentId = doorPath.split('/').pop()!;
  const component = await cast.admin.send<{
    version: number;
    issuedRevision: { id: string; contentHash: string };
  }>('GET', `/components/${componentId}`);
  const issued = await cast.admin.send<{ verifyCode: string; inputs: Record<string, unknown> }>(
    'GET',
    `/revisions/${component.issuedRevision.id}`,
  );
  // Signed out, as anyone scanning the sheet's QR code.
  await page.goto(`/verify/${issued.verifyCode}`);
  const answer = page.getByRole('region', { name: /matches a countersigned revision/ });
  await expect(answer).toBeVisible();
  await expect(answer).toContainText(projectNumber);
  await expect(answer).toContainText('Cabinet door plate');
  await expect(answer).toContainText('latest countersigned revision');
  // What the holder compares the paper with (a sheet with altered numbers but a copied code):
  // the kind, the thickness countersigned (10 mm = 0.3937 in), the material, the verdict,
  // the governing check and who prepared and countersigned it, as the API answers them.
  const facts = await page.request
    .get(`/api/verify/${issued.verifyCode}`)
    .then((r) => r.json() as Promise<Record<string, unknown>>);
  const detail = (term: string) =>
    answer
      .locator('dt', { hasText: new RegExp(`^${term}$`) })
      .locator('xpath=following-sibling::dd[1]');
  await expect(detail('Kind')).toHaveText('Circular flat plate');
  await expect(detail('Thickness')).toHaveText('10 mm (0.3937 in)');
  await expect(detail('Material')).toHaveText(String(facts.material));
  await expect(detail('Screening result')).toContainText(/PASSES/);
  await expect(detail('Governing check')).toContainText(/at\s*\d+(\.\d)? %/);
  await expect(detail('Prepared by')).toContainText(cast.designer.name);
  await expect(detail('Countersigned by')).toContainText(cast.checker.name);
  await expect(detail('Content hash')).toContainText(component.issuedRevision.contentHash);
  await expect(page.getByRole('complementary', { name: 'Screening caution' })).toBeVisible();
  await expect(page.getByRole('navigation')).toHaveCount(0);
  await expect(page.getByRole('link', { name: 'Sign in' })).toBeVisible();
  await expectAccessible(page, 'verify: match');
  await screenshot(page, 'verify-match');

  // The form: a malformed code is refused on the field, an unknown one matches nothing.
  const field = page.getByLabel('Verify code or content hash');
  await field.fill('12-34');
  await page.getByRole('button', { name: 'Verify' }).click();
  await expect(field).toHaveAccessibleDescription(/That is 4 digits/);
  await field.fill('0000-0000-0000');
  await page.getByRole('button', { name: 'Verify' }).click();
  await expect(page).toHaveURL(/\/verify\/0000-0000-0000$/);
  await expect(
    page.getByRole('region', { name: /does not match any countersigned revision/ }),
  ).toBeVisible();
  await expectAccessible(page, 'verify: no match');
  await screenshot(page, 'verify-no-match');

  // Revision 2 (a thicker plate), submitted by the designer and countersigned by the checker.
  const designer = await Api.signIn(cast.admin.base, cast.designer.email, cast.designer.password);
  const saved = await designer.send<{ revision: { id: string } }>(
    'POST',
    `/components/${componentId}/revisions`,
    { inputs: { ...issued.inputs, thickness: '11 mm' }, baseVersion: component.version },
  );
  await designer.send('POST', `/revisions/${saved.revision.id}/submit`);
  const checker = await Api.signIn(cast.admin.base, cast.checker.email, cast.checker.password);
  const second = await checker.send<{ contentHash: string }>(
    'GET',
    `/revisions/${saved.revision.id}`,
  );
  await checker.send('POST', `/revisions/${saved.revision.id}/countersign`, {
    hash: second.contentHash,
  });
  await designer.dispose();
  await checker.dispose();

  await page.goto(`/verify/${issued.verifyCode}`);
  const superseded = page.getByRole('region', { name: /has been superseded/ });
  await expect(superseded).toBeVisible();
  await expect(superseded).toContainText('ask for the current sheet');
  await expectAccessible(page, 'verify: superseded');
  await screenshot(page, 'verify-superseded');
});

test('an admin sees people and the audit log', async ({ page }) => {
  await page.goto('/people');
  await signIn(page, { email: 'theo.brandt@larchmont.example', password: 'theo-admin-demo-2026' });
  await expect(page.getByRole('heading', { name: 'People' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Accounts' })).toBeVisible();
  await expectAccessible(page, 'people');
  await screenshot(page, 'people');
  await page.getByRole('link', { name: 'Audit log' }).click();
  await expect(page.getByRole('table', { name: 'Audit events, newest first' })).toBeVisible();
  await expectAccessible(page, 'audit log');
  await screenshot(page, 'audit-log');
  // The seeded demo's acrylic viewport has a returned revision 1 and a revision 2: compare them.
  await page.getByRole('link', { name: 'Projects' }).click();
  // The audit log links projects too: wait for the list before picking one.
  await expect(page.getByRole('heading', { name: 'Projects' })).toBeVisible();
  await page.getByRole('link', { name: 'LAM-2026-014' }).click();
  await page.getByRole('link', { name: 'VDC-3 acrylic viewport' }).click();
  await page.getByRole('link', { name: 'Revisions' }).click();
  await expectAccessible(page, 'revisions');
  await screenshot(page, 'revisions');
  await page.getByLabel('Compare revision 1').check();
  await page.getByLabel('Compare revision 2').check();
  await page.getByRole('button', { name: 'Compare 1 and 2' }).click();
  await expect(page.getByRole('table', { name: /Changed inputs/ })).toBeVisible();
  await expect(page.locator('tr[data-changed="true"]').first()).toBeVisible();
  await expectAccessible(page, 'compare');
  await screenshot(page, 'compare');
  await page.goto('/no/such/page');
  await expect(page.getByRole('heading', { name: 'No such page' })).toBeVisible();
  await screenshot(page, 'not-found');
});

test('an invitation sent from People is accepted in the browser', async ({ page }) => {
  await page.goto('/people');
  await signIn(page, { email: 'theo.brandt@larchmont.example', password: 'theo-admin-demo-2026' });
  // On the People page, not still on sign-in (both have an E-mail field).
  await expect(page.getByRole('heading', { name: 'People' })).toBeVisible();
  const email = `invitee-${Date.now().toString(36)}@journeys.example`;
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Name').fill('Ines Invitee');
  await page.getByRole('button', { name: 'Send invitation' }).click();
  // Mailed, not shown: the e2e server has an SMTP server (the fake one).
  await expect(page.getByText(`Invitation mailed to ${email}.`, { exact: false })).toBeVisible();
  await expect(page.getByRole('textbox', { name: 'Link' })).toHaveCount(0);
  await screenshot(page, 'people-invitation-mailed');
  const mail = await waitForMail(email, { subject: /invited/i });
  expect(mail.text).toContain('has invited you to Hoopline');
  const link = linkIn(mail, /^\/invitation\/[^/]+$/);
  await signOut(page);
  await page.goto(link);
  await expect(page.getByRole('heading', { name: 'Accept your invitation' })).toBeVisible();
  await expect(page.getByLabel('E-mail')).toHaveValue(email);
  await page.getByLabel(/^Password/).fill('invitee-password-2026');
  await page.getByLabel('Repeat the password').fill('invitee-password-2026');
  await expectAccessible(page, 'accept invitation');
  await screenshot(page, 'accept-invitation');
  await page.getByRole('button', { name: 'Accept and sign in' }).click();
  await expect(page.getByRole('heading', { name: 'Projects' })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Ines Invitee' })).toBeVisible();
  await signOut(page);

  // The admin resets her password: the link is mailed to her, and works.
  await page.goto('/people');
  await signIn(page, { email: 'theo.brandt@larchmont.example', password: 'theo-admin-demo-2026' });
  await page.getByRole('searchbox', { name: 'Search people' }).fill(email);
  await page.getByRole('button', { name: 'Search', exact: true }).click();
  const since = new Date(Date.now() - 1000);
  await page.getByRole('button', { name: /Reset password\s*of Ines Invitee/ }).click();
  await expect(page.getByText(`Reset link mailed to ${email}.`, { exact: false })).toBeVisible();
  const reset = linkIn(
    await waitForMail(email, { subject: /reset/i, since }),
    /^\/reset-password\/[^/]+$/,
  );
  await signOut(page);
  await page.goto(reset);
  await page.getByLabel(/^New password/).fill('invitee-new-password-2026');
  await page.getByLabel('Repeat the new password').fill('invitee-new-password-2026');
  await page.getByRole('button', { name: 'Set the new password' }).click();
  await expect(page.getByText('Your password has been changed')).toBeVisible();
  await page.getByRole('link', { name: 'Sign in with the new password' }).click();
  await signIn(page, { email, password: 'invitee-new-password-2026' });
  await expect(page.getByRole('heading', { name: 'Projects' })).toBeVisible();
});
