import { describe, expect, it } from 'vitest';
import { matchPath } from 'react-router-dom';
import { routes } from './routes';

describe('routes', () => {
  it('builds the fixed paths the router matches', () => {
    expect(routes.dashboard.build()).toBe('/');
    expect(routes.classes.build()).toBe('/classes');
    expect(routes.banks.build()).toBe('/banks');
    expect(routes.sessions.build()).toBe('/sessions');
    expect(routes.debriefs.build()).toBe('/debriefs');
    expect(routes.adminStaff.build()).toBe('/admin/staff');
    expect(routes.forgotPassword.build()).toBe('/forgot-password');
  });

  it('puts ids into their path segment, encoded, so the pattern matches them back', () => {
    expect(routes.bank.build('b-42')).toBe('/banks/b-42');
    const built = routes.bank.build('a/b c');
    expect(built).toBe('/banks/a%2Fb%20c');
    expect(matchPath(routes.bank.path, built)).not.toBeNull();
    expect(decodeURIComponent(built.split('/')[2])).toBe('a/b c');
    expect(matchPath(routes.session.path, routes.session.build('s1'))?.params.sessionId).toBe('s1');
    expect(matchPath(routes.classDetail.path, routes.classDetail.build('c9'))?.params.classId).toBe('c9');
  });

  it('carries e-mailed link tokens in the query string', () => {
    expect(routes.resetPassword.build('tok+/=')).toBe('/reset-password?token=tok%2B%2F%3D');
    expect(routes.acceptInvite.build('abc')).toBe('/accept-invite?token=abc');
    const url = new URL(routes.resetPassword.build('tok+/='), 'http://localhost');
    expect(url.pathname).toBe(routes.resetPassword.path);
    expect(url.searchParams.get('token')).toBe('tok+/=');
  });

  it('adds ?next= to sign-in only when there is somewhere to return to', () => {
    expect(routes.signIn.build()).toBe('/sign-in');
    expect(routes.signIn.build('')).toBe('/sign-in');
    expect(routes.signIn.build('/banks?tab=mine')).toBe('/sign-in?next=%2Fbanks%3Ftab%3Dmine');
  });
});
