import { describe, expect, it } from 'vitest';
import { redirectWithinSite, safeCallbackPath } from './safe-callback-path';

// Where a browser takes each shape is what the WHATWG URL Standard's parser gives for it (basic URL
// parser: leading/trailing C0 controls and spaces stripped, ASCII tab and newline removed, "\" read
// as "/" in special schemes); the shapes are the usual open-redirect bypasses (common practice, e.g.
// OWASP's Unvalidated Redirects and Forwards cheat sheet).
const BASE = 'http://localhost:3000';
const whereBrowserGoes = (path: string) => new URL(path, BASE).origin;

describe('safeCallbackPath', () => {
  it.each([
    ['/\\evil.example/x'],
    ['\\\\evil.example/x'],
    ['/\t/evil.example/x'],
    ['/\n/evil.example/x'],
    ['/\r/evil.example'],
    ['\t//evil.example'],
    [' //evil.example'],
    ['\u0000//evil.example'],
    ['//evil.example'],
    ['///evil.example'],
    ['/.//evil.example'],
    ['/\\/evil.example'],
    ['https://evil.example/x'],
    ['javascript:alert(1)'],
    ['evil.example'],
    ['/dashboard\u0000'],
    [''],
  ])('refuses %j and falls back to the dashboard', (raw) => {
    expect(safeCallbackPath(raw)).toBe('/dashboard');
  });

  it.each([
    ['/reports/12', '/reports/12'],
    ['/compare?maker=Corvane&sort=score#table', '/compare?maker=Corvane&sort=score#table'],
    ['/machines/%5Cnot-a-host', '/machines/%5Cnot-a-host'],
    ['/a/../reports', '/reports'],
  ])('keeps the same-site path %j as %j', (raw, expected) => {
    expect(safeCallbackPath(raw)).toBe(expected);
  });

  it('never hands back a path a browser would take off the site', () => {
    const shapes = ['/\\evil.example/x', '/\t/evil.example', '/.//evil.example', '/%5Cevil.example', '/%2F%2Fevil.example', '/reports/1'];
    for (const shape of shapes) expect(whereBrowserGoes(safeCallbackPath(shape))).toBe(BASE);
  });

  it('falls back for something that is not text', () => {
    expect(safeCallbackPath(undefined)).toBe('/dashboard');
    expect(safeCallbackPath(42)).toBe('/dashboard');
  });
});

describe('redirectWithinSite', () => {
  it.each([
    ['/\\evil.example/x', `${BASE}/`],
    ['/\t/evil.example/x', `${BASE}/`],
    ['https://evil.example/x', `${BASE}/`],
    [' https://evil.example/x', `${BASE}/`],
    ['http:evil.example', `${BASE}/`],
    ['javascript:alert(1)', `${BASE}/`],
    [`${BASE}/reports/3?v=2`, `${BASE}/reports/3?v=2`],
    [`${BASE}/\\evil.example`, `${BASE}/`],
    ['/dashboard', `${BASE}/dashboard`],
  ])('sends %j to %j', (url, expected) => {
    const target = redirectWithinSite({ url, baseUrl: BASE });
    expect(target).toBe(expected);
    expect(new URL(target).origin).toBe(BASE);
  });
});
