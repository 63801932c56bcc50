// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { errorReply, installFakeServer } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import OutboxMessageItem from './OutboxMessageItem.vue';

const origin = window.location.origin;
const message = {
  id: '2b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a12',
  from: 'Porelith <no-reply@porelith.test>',
  to: 'sam@example.org',
  subject: 'You are invited to North Shelf',
  text: `Open ${origin}/accept-invite?token=abcdefghijklmnopqrstuvwxyz to join.\nHelp: https://help.example.org/start`,
  receivedAt: '2025-03-04T09:30:00Z',
};

describe('OutboxMessageItem', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('shows subject, recipient and time, with the body in an expandable row', async () => {
    installFakeServer({ 'GET /api/auth/me': () => errorReply(401, 'unauthenticated', 'Sign in first.') });
    const { wrapper } = await mountInApp(OutboxMessageItem, { props: { message } });
    const item = wrapper.get('[data-testid="outbox-item"]');

    expect(item.element.tagName).toBe('DETAILS');
    expect(item.get('summary').text()).toContain('You are invited to North Shelf');
    expect(item.get('summary').text()).toContain('sam@example.org');
    expect(item.get('time').attributes('datetime')).toBe('2025-03-04T09:30:00Z');
  });

  it('keeps app links inside the app and opens other links in a new tab', async () => {
    installFakeServer({ 'GET /api/auth/me': () => errorReply(401, 'unauthenticated', 'Sign in first.') });
    const { wrapper, router } = await mountInApp(OutboxMessageItem, { props: { message } });
    const [invite, help] = wrapper.findAll('[data-testid="outbox-link"]');

    expect(invite.attributes('href')).toBe('/accept-invite?token=abcdefghijklmnopqrstuvwxyz');
    expect(invite.attributes('target')).toBeUndefined();
    expect(help.attributes('href')).toBe('https://help.example.org/start');
    expect(help.attributes('target')).toBe('_blank');
    expect(help.attributes('rel')).toContain('noopener');

    await invite.trigger('click');
    await vi.waitFor(() => expect(router.currentRoute.value.path).toBe('/accept-invite'));
    expect(router.currentRoute.value.query.token).toBe('abcdefghijklmnopqrstuvwxyz');
  });
});
