import { describe, expect, it } from 'vitest';
import { boatPatchSchema, tacklePlanPatchSchema } from './boats';
import { planPatchSchema } from './dues';
import { postPatchSchema, topicPatchSchema } from './knowledge';
import { updateAccountSchema } from './auth';
import { patchOf } from './patch';
import { z } from 'zod';

describe('partial PATCH resets omitted fields', () => {
  it('patchOf keeps a default out of a change that does not name the field', () => {
    const schema = z.object({ a: z.string().default('x'), b: z.number() });
    expect(patchOf(schema).parse({ b: 1 })).toEqual({ b: 1 });
    expect(patchOf(schema).parse({ a: 'y' })).toEqual({ a: 'y' });
  });

  // One field sent: the parsed change names that field and nothing else, in every shared PATCH schema.
  it.each([
    ['boat', boatPatchSchema, { name: 'Renamed' }],
    ['tackle plan', tacklePlanPatchSchema, { name: 'Renamed' }],
    ['post', postPatchSchema, { title: 'Renamed post' }],
    ['dues plan', planPatchSchema, { name: 'Renamed' }],
    ['topic', topicPatchSchema, { name: 'Renamed' }],
    ['account', updateAccountSchema, { unitSystem: 'metric' }],
  ] as const)('a %s change with one field parses to that field only', (_label, schema, body) => {
    expect(Object.keys(schema.parse(body))).toEqual(Object.keys(body));
  });
});
