import { execFileSync } from 'node:child_process';
import { readFile, writeFile } from 'node:fs/promises';
import type { Page } from '@playwright/test';
import { parse } from 'csv-parse/sync';
import { expect, expectAccessible, screenshot, signIn, signOut, test } from '../support/fixtures';
import type { Cast } from '../support/fixtures';

/**
 * The project as a chamber (issue 14.5), from nothing through the UI: a
 * designer builds a glovebox (a stiffened flat wall and a polycarbonate
 * viewport) and a vacuum oven (a stiffened wall running hot at 200 °C and a
 * pump port at the same temperature) and submits them; a checker
 * countersigns all four; the project table shows each with its governing
 * check and utilisation, the CSV downloads with the same numbers, the issue
 * package downloads (its page count and index read with poppler), and its
 * package code verifies on the public page.
 */
test.describe.configure({ mode: 'serial' });

const run = Date.now().toString(36).toUpperCase();
const projects = {
  glovebox: { number: `GB-${run}`, name: 'Glovebox GB-9', path: '' },
  oven: { number: `VO-${run}`, name: 'Vacuum oven VO-9', path: '' },
};
const COMPONENTS = ['Glovebox side wall', 'Glovebox viewport', 'Oven rear wall', 'Oven pump port'];

async function newProject(page: Page, cast: Cast, p: (typeof projects)['glovebox']) {
  await page.goto('/projects/new');
  await page.getByLabel('Project number').fill(p.number);
  await page.getByLabel('Project name').fill(p.name);
  await page.getByLabel('Client').fill('Larchmont Applied Materials Lab');
  await page.getByRole('button', { name: 'Create project' }).click();
  await expect(page.getByRole('heading', { name: `${p.number} ${p.name}` })).toBeVisible();
  p.path = new URL(page.url()).pathname;
  await page.goto(`${p.path}/members`);
  for (const [email, role] of [
    [cast.checker.email, 'Checker'],
    [cast.fabricator.email, 'Fabricator'],
  ] as const) {
    await page.getByLabel('E-mail address').fill(email);
    await page.getByLabel('Role', { exact: true }).selectOption({ label: role });
    await page.getByRole('button', { name: 'Add member' }).click();
    await expect(page.getByRole('status').filter({ hasText: `added as ${role}` })).toBeVisible();
  }
}

/** Opens the workbench for a new component of a kind and names it. */
async function startComponent(page: Page, projectPath: string, kind: string, name: string) {
  await page.goto(projectPath);
  await page.getByRole('link', { name: 'New component' }).click();
  await page.getByLabel(kind).click();
  await expect(page.getByText(`Kind: ${kind}`)).toBeVisible();
  await page.getByLabel('Component name').fill(name);
}

const verdictOf = (page: Page) =>
  page
    .getByRole('region', { name: 'Results' })
    .getByText(/^(Passes|Fails|Outside validity|No checks)$/)
    .first();

/** The flat bars of a stiffened wall, as the stiffened-wall journey enters them. */
async function stiffenedWall(
  page: Page,
  wall: { span: string; spacing: string; thickness: string; depth: string; bar: string },
) {
  await page.getByLabel('Stiffener span', { exact: true }).fill(wall.span);
  await page.getByLabel('Wall plate thickness', { exact: true }).fill(wall.thickness);
  await page.getByLabel('Stiffener section').selectOption({ label: 'Flat bar on edge' });
  await page.getByLabel('Stiffener depth (off the plate)').fill(wall.depth);
  await page.getByLabel('Stiffener thickness', { exact: true }).fill(wall.bar);
  await page.getByLabel('Stiffener spacing', { exact: true }).fill(wall.spacing);
}

async function saveAndSubmit(page: Page) {
  await page.getByRole('button', { name: 'Save as revision 1' }).click();
  await expect(page.getByText('Revision 1 as saved, computed by the server')).toBeVisible();
  await page.getByRole('button', { name: 'Submit revision 1 for check' }).click();
  await expect(page.getByText(/Revision 1 is awaiting check/)).toBeVisible();
}

test('a designer builds a glovebox: a stiffened wall and a polycarbonate viewport', async ({
  page,
  cast,
}) => {
  await page.goto('/projects');
  await signIn(page, cast.designer);
  await newProject(page, cast, projects.glovebox);

  await startComponent(page, projects.glovebox.path, 'Stiffened flat wall', 'Glovebox side wall');
  await stiffenedWall(page, {
    span: '1000 mm',
    spacing: '400 mm',
    thickness: '3 mm',
    depth: '50 mm',
    bar: '6 mm',
  });
  await expect(verdictOf(page)).toHaveText('Passes');
  await saveAndSubmit(page);

  await startComponent(page, projects.glovebox.path, 'Rectangular flat plate', 'Glovebox viewport');
  await page.getByLabel('Material', { exact: true }).selectOption('polycarbonate');
  await page.getByLabel('Unsupported width', { exact: true }).fill('400 mm');
  await page.getByLabel('Unsupported height', { exact: true }).fill('300 mm');
  await page.getByLabel('Thickness', { exact: true }).fill('10 mm');
  await expect(page.getByRole('complementary', { name: 'Screening caution' })).toBeVisible();
  await expect(page.getByText(/craz/i).first()).toBeVisible();
  await saveAndSubmit(page);
  await signOut(page);
});

test('a designer builds a vacuum oven: a stiffened wall at 200 °C and a pump port', async ({
  page,
  cast,
}) => {
  await page.goto('/projects');
  await signIn(page, cast.designer);
  await newProject(page, cast, projects.oven);

  await startComponent(page, projects.oven.path, 'Stiffened flat wall', 'Oven rear wall');
  await stiffenedWall(page, {
    span: '700 mm',
    spacing: '200 mm',
    thickness: '8 mm',
    depth: '80 mm',
    bar: '10 mm',
  });
  await page.getByLabel('Material', { exact: true }).selectOption('stainless-304');
  // The oven runs at full vacuum: the first load case becomes the cure.
  await page.getByLabel('Name', { exact: true }).first().fill('Cure: full vacuum');
  await page.getByLabel('Inside pressure').first().fill('full vacuum');
  const summary = page.getByText(/^Governing:/);
  const cold = await summary.textContent();
  await page.getByLabel('Design temperature (optional)').fill('200 degC');
  // Hot, the 304 is derated (ASME II-D tables): the governing utilisation moves.
  await expect(summary).not.toHaveText(cold ?? '');
  await expect(page.getByText('Properties at the design temperature').first()).toBeVisible();
  await saveAndSubmit(page);

  await startComponent(page, projects.oven.path, 'Opening (nozzle or port)', 'Oven pump port');
  await page.getByLabel('Design temperature (optional)').fill('200 degC');
  await expect(summary).toBeVisible();
  await expectAccessible(page, 'oven port editor');
  await saveAndSubmit(page);
  await signOut(page);
});

test('a checker countersigns all four from the queue', async ({ page, cast }) => {
  await page.goto('/check-queue');
  await signIn(page, cast.checker);
  for (const name of COMPONENTS) {
    await page.goto('/check-queue');
    const link = page.getByRole('link', { name: new RegExp(`${name} · revision 1`) });
    await link.click();
    await expect(page.getByRole('table', { name: 'Calculation trail' })).toBeVisible();
    await page.getByRole('button', { name: 'Countersign' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Countersign revision' }).click();
    await expect(
      page.getByRole('heading', { name: new RegExp(`Revision 1 of ${name}.* countersigned`) }),
    ).toBeVisible();
    await page.goto('/check-queue');
    await expect(page.getByRole('heading', { name: 'Check queue' })).toBeVisible();
    await expect(page.getByRole('row', { name: new RegExp(`${name} · revision 1`) })).toHaveCount(
      0,
    );
  }
  await signOut(page);
});

interface TableAnswer {
  rows: {
    component: { name: string };
    revision: { id: string; number: number; status: string } | null;
    governing: { checkLabel: string; utilisation: number } | null;
  }[];
}

test('the project table, its CSV and the issue package agree, and the package code verifies', async ({
  page,
  cast,
}) => {
  await page.goto('/projects');
  await signIn(page, cast.fabricator);
  for (const p of [projects.glovebox, projects.oven]) {
    await page.goto(p.path);
    const table = page.getByRole('table', { name: 'Components of this project' });
    await expect(table.getByRole('row')).toHaveCount(3);
    const stored = await cast.admin.send<TableAnswer>(
      'GET',
      `/projects/${p.path.split('/').pop()}/components/table`,
    );
    const shown = new Map<string, string>();
    for (const r of stored.rows) {
      const row = table.getByRole('row', { name: new RegExp(`^${r.component.name}`) });
      // The governing check's label and its utilisation as the table prints them.
      await expect(row).toContainText(r.governing!.checkLabel);
      await expect(row).toContainText('Countersigned');
      const cell = (await row.getByRole('cell').nth(4).textContent()) ?? '';
      expect(cell).toMatch(/^\d+(\.\d+)? %$/);
      expect(
        Math.abs(Number(cell.replace(' %', '')) - r.governing!.utilisation * 100),
      ).toBeLessThanOrEqual(0.1);
      shown.set(r.component.name, cell.replace(' %', ''));
    }
    // Sorted by utilisation, highest first: the order of the stored figures.
    await table.getByRole('button', { name: /^Utilisation/ }).click();
    await table.getByRole('button', { name: /^Utilisation/ }).click();
    const order = [...stored.rows]
      .sort((a, b) => b.governing!.utilisation - a.governing!.utilisation)
      .map((r) => r.component.name);
    await expect(table.getByRole('row').nth(1)).toContainText(order[0]!);
    await expectAccessible(page, 'project table');
    await screenshot(page, `chamber-table-${p.number.slice(0, 2)}`);

    // The CSV: the same rows, the same figures.
    const [csvDownload] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download table (CSV)' }).click(),
    ]);
    expect(csvDownload.suggestedFilename()).toBe(`${p.number}_components.csv`);
    const records = parse(await readFile(await csvDownload.path()), { bom: true }) as string[][];
    expect(records[0]![9]).toBe('Utilisation (%)');
    expect(new Map(records.slice(1).map((r) => [r[1]!, r[9]!]))).toEqual(shown);

    // The issue package: the index, then the two countersigned sheets.
    const [response, pkgDownload] = await Promise.all([
      page.waitForResponse((r) => r.url().includes('/package.pdf')),
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download issue package' }).click(),
    ]);
    expect(response.status()).toBe(200);
    const code = response.headers()['x-hoopline-package-code']!;
    await expect(page.getByRole('status').filter({ hasText: code })).toBeVisible();
    const file = await pkgDownload.path();
    expect((await readFile(file)).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const pages = (path: string) =>
      Number(/Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', [path], { encoding: 'utf8' }))![1]);
    let sheetPages = 0;
    for (const r of stored.rows) {
      const sheet = await cast.admin.context.get(`/api/revisions/${r.revision!.id}/sheet.pdf`);
      const bytes = await sheet.body();
      const tmp = `${file}.${r.revision!.number}-${sheetPages}.pdf`;
      await writeFile(tmp, bytes);
      sheetPages += pages(tmp);
    }
    const index = execFileSync('pdftotext', ['-f', '1', '-l', '1', '-raw', file, '-'], {
      encoding: 'utf8',
    }).replaceAll('\u2009', '');
    expect(index).toContain(`Issue package: ${p.number} — ${p.name}`);
    expect(index).toContain(code);
    for (const r of stored.rows) expect(index).toContain(r.component.name);
    expect(pages(file)).toBe(1 + sheetPages);

    // The code on the public page, signed out or not: current, with both revisions.
    await page.getByRole('link', { name: 'verify it' }).click();
    const answer = page.getByRole('region', { name: /matches the current issue package/ });
    await expect(answer).toBeVisible();
    await expect(answer).toContainText(`${p.number} ${p.name}`);
    for (const r of stored.rows) {
      await expect(
        answer.getByRole('listitem', { name: `${r.component.name} revision 1` }),
      ).toBeVisible();
    }
    await expectAccessible(page, 'package verify');
    await screenshot(page, `chamber-verify-${p.number.slice(0, 2)}`);
  }
  await page.goto('/projects');
  await signOut(page);
});
