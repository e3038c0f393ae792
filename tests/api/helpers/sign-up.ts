import { Me } from '../../../shared/schemas/account.ts';
import { type BrowserLike, browserLike } from './agents.ts';
import { linkIn, waitForMail } from './mail.ts';
import type { TestApp } from './test-app.ts';

/** Signs up through the API, follows the mailed confirmation link, and returns the signed-in browser. */
export async function signUpConfirmed(t: TestApp, body: { name: string; email: string; password: string; workspaceName: string }): Promise<{ b: BrowserLike; me: Me }> {
  const b = await browserLike(t.url);
  await b.post('/api/auth/signup', body).expect(202);
  const mail = await waitForMail(t.db, body.email, 'Confirm your address');
  const { token } = linkIn(mail.text_body, '/confirm/');
  const me = Me.parse((await b.post('/api/auth/confirm', { token }).expect(200)).body);
  return { b, me };
}
