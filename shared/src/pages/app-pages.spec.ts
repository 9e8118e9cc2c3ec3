import { describe, expect, it } from 'vitest';
import { APP_PAGE_ALIASES, isAppPage } from './app-pages.js';

describe('isAppPage', () => {
  it('knows every page pattern, with a value in each :segment and one optional trailing slash', () => {
    for (const path of [
      '/',
      '/sign-in',
      '/collection',
      '/collection/4b1d',
      '/projects/new',
      '/projects/p1/account',
      '/invitations/tok.en',
      '/progress/tok_en-1',
      '/settings/payouts/',
    ])
      expect(isAppPage(path), path).toBe(true);
  });

  it('refuses other paths, deeper paths and dot segments', () => {
    for (const path of ['/nope', '/wp-login.php', '/collection/a/b', '/projects/p1/terms', '/sacs', '/sacs//x', '/collection/..', '/login'])
      expect(isAppPage(path), path).toBe(false);
  });

  it('sends /login on to a page', () => {
    expect(isAppPage(APP_PAGE_ALIASES['/login'])).toBe(true);
  });
});
