import { request, type APIRequestContext } from '@playwright/test';
import { linkIn, waitForMail } from './mailbox';

/**
 * People for the journeys, made through the API the way an admin would: the
 * seeded admin invites them, the invitation arrives by mail (the e2e server's
 * fake SMTP server) and each accepts it with the token from the mail's link.
 * Every run makes new addresses, so runs never share users.
 */
export interface Person {
  readonly id: string;
  readonly name: string;
  readonly email: string;
  readonly password: string;
}

// The seeded demo admin (apps/api/src/seed/demo-scenario.ts; its development password applies when
// the installation has no secret of its own, as on the e2e server).
export const SEEDED_ADMIN = {
  email: 'theo.brandt@larchmont.example',
  password: 'theo-admin-demo-2026',
};

/** An API client signed in as someone, sending the CSRF header on writes as the web app does. */
export class Api {
  private constructor(
    readonly context: APIRequestContext,
    private readonly baseURL: string,
  ) {}

  static async signIn(baseURL: string, email: string, password: string): Promise<Api> {
    const context = await request.newContext({ baseURL });
    const response = await context.post('/api/auth/sign-in', { data: { email, password } });
    if (!response.ok())
      throw new Error(`sign-in of ${email} failed: ${response.status()} ${await response.text()}`);
    return new Api(context, baseURL);
  }

  private async csrf(): Promise<string> {
    const state = await this.context.storageState();
    return state.cookies.find((c) => c.name === 'hl_csrf')?.value ?? '';
  }

  async send<T>(
    method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE',
    path: string,
    data?: unknown,
  ): Promise<T> {
    const response = await this.context.fetch(`/api${path}`, {
      method,
      headers: method === 'GET' ? {} : { 'x-csrf-token': await this.csrf() },
      ...(data === undefined ? {} : { data }),
    });
    if (!response.ok())
      throw new Error(`${method} ${path}: ${response.status()} ${await response.text()}`);
    const text = await response.text();
    return (text ? JSON.parse(text) : undefined) as T;
  }

  async dispose(): Promise<void> {
    await this.context.dispose();
  }

  get base(): string {
    return this.baseURL;
  }
}

let counter = 0;

/**
 * Invites and signs up a new person; returns their credentials and id. With
 * `mayCreateProjects` the admin then names them as someone who starts
 * projects (the installation's default lets only named people).
 */
export async function createPerson(
  admin: Api,
  label: string,
  options: { mayCreateProjects?: boolean } = {},
): Promise<Person> {
  counter += 1;
  const stamp = `${Date.now().toString(36)}${counter}`;
  const email = `${label.toLowerCase().replace(/\W+/g, '-')}-${stamp}@journeys.example`;
  const name = `${label} ${stamp.slice(-4).toUpperCase()}`;
  const password = `journey-${stamp}-password`;
  const sent = await admin.send<{ delivery: 'mail' | 'shown'; token?: string }>(
    'POST',
    '/invitations',
    { email, name },
  );
  if (sent.delivery !== 'mail') throw new Error('the e2e server should mail invitations');
  const link = linkIn(await waitForMail(email, { subject: /invited/i }), /^\/invitation\/[^/]+$/);
  const token = decodeURIComponent(link.split('/').pop()!);
  const context = await request.newContext({ baseURL: admin.base });
  const accepted = await context.post('/api/auth/accept-invitation', {
    data: { token, name, password },
  });
  if (!accepted.ok())
    throw new Error(
      `accepting the invitation of ${email} failed: ${accepted.status()} ${await accepted.text()}`,
    );
  const me = (await accepted.json()) as { user: { id: string } };
  await context.dispose();
  if (options.mayCreateProjects)
    await admin.send('PATCH', `/users/${me.user.id}`, { mayCreateProjects: true });
  return { id: me.user.id, name, email, password };
}
