import { describe, expect, it } from 'vitest';
import { linkProblem } from './link-address';

describe('linkProblem', () => {
  it.each([
    ['https://example.org/notes', null],
    ['http://example.org', null],
    ['mailto:moderators@harbour.example', null],
    ['', null],
  ])('accepts %s', (href, expected) => expect(linkProblem(href)).toBe(expected));

  it.each([
    ['javascript:alert(1)', /web address/],
    ['data:text/html,hi', /web address/],
    ['https://', /full address/],
    ['example.org', /full address/],
    ['mailto:nobody', /full address|web address/],
  ])('refuses %s', (href, message) => expect(linkProblem(href)).toMatch(message));
});
