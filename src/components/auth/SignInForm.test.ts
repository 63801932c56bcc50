// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import { errorReply, installFakeServer, jsonReply, twoTeamSession } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import { useSessionStore } from '@/stores/session';
import SignInForm from './SignInForm.vue';

// The form is checked against the API contract (POST /api/auth/sign-in {email,password} → Session).
describe('SignInForm', () => {
  beforeEach(() => localStorage.clear());
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('signs in with what was typed when the form is submitted (Enter) and reports success', async () => {
    const seen: unknown[] = [];
    installFakeServer({
      'GET /api/auth/me': () => errorReply(401, 'unauthenticated', 'Sign in first.'),
      'POST /api/auth/sign-in': (body) => {
        seen.push(body);
        return jsonReply(200, twoTeamSession);
      },
    });
    const { wrapper } = await mountInApp(SignInForm);
    const form = wrapper.findComponent(SignInForm);

    await wrapper.get('[data-testid="signin-email"] input').setValue('  Ada@Example.org ');
    await wrapper.get('[data-testid="signin-password"] input').setValue('correct horse battery');
    // Browsers turn Enter in a text field into a submit event on its form (HTML "implicit submission").
    await wrapper.get('form').trigger('submit');
    await flushPromises();

    // The shared schema trims and lower-cases the address before it is sent.
    expect(seen).toEqual([{ email: 'ada@example.org', password: 'correct horse battery' }]);
    expect(form.emitted('signedIn')).toHaveLength(1);
    expect(useSessionStore().user?.name).toBe('Ada Moreno');
  });

  it('submits by clicking the button, shows the server reason on failure and stays on the form', async () => {
    installFakeServer({
      'GET /api/auth/me': () => errorReply(401, 'unauthenticated', 'Sign in first.'),
      'POST /api/auth/sign-in': () => errorReply(429, 'rate_limited', 'Too many attempts. Try again in a minute.'),
    });
    const { wrapper } = await mountInApp(SignInForm);
    await wrapper.get('[data-testid="signin-email"] input').setValue('ada@example.org');
    await wrapper.get('[data-testid="signin-password"] input').setValue('whatever');
    (wrapper.get('[data-testid="signin-submit"]').element as HTMLButtonElement).click();
    await flushPromises();

    expect(wrapper.get('[data-testid="signin-error"]').text()).toContain('Too many attempts. Try again in a minute.');
    expect(wrapper.findComponent(SignInForm).emitted('signedIn')).toBeUndefined();
  });

  it('checks the e-mail before asking the server', async () => {
    const fetchMock = installFakeServer({
      'GET /api/auth/me': () => errorReply(401, 'unauthenticated', 'Sign in first.'),
    });
    const { wrapper } = await mountInApp(SignInForm);
    await wrapper.get('[data-testid="signin-email"] input').setValue('not-an-address');
    await wrapper.get('[data-testid="signin-password"] input').setValue('x');
    await wrapper.get('form').trigger('submit');
    await flushPromises();

    expect(wrapper.text()).toContain('E-mail must be a valid e-mail address');
    expect(fetchMock.mock.calls.map((c) => String(c[0]))).toEqual(['/api/auth/me']);
  });
});
