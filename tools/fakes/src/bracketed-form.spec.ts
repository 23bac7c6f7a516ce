import { describe, expect, it } from 'vitest';
import { FormSyntaxError, parseBracketedForm } from './bracketed-form.js';

describe('parseBracketedForm', () => {
  it('nests bracketed keys and turns indexed keys into arrays', () => {
    const form = parseBracketedForm('amount=1000&metadata[branchId]=b%201&expand[0]=data.charge&expand[1]=x&created[gte]=17&tags[]=a&tags[]=b');
    expect(JSON.parse(JSON.stringify(form))).toEqual({
      amount: '1000',
      metadata: { branchId: 'b 1' },
      expand: ['data.charge', 'x'],
      created: { gte: '17' },
      tags: ['a', 'b'],
    });
  });

  it('reads percent-encoded brackets the same as plain ones', () => {
    expect(JSON.parse(JSON.stringify(parseBracketedForm('metadata%5Bk%5D=v')))).toEqual({ metadata: { k: 'v' } });
  });

  it('refuses a key that is both a value and an object, and prototype keys', () => {
    expect(() => parseBracketedForm('a=1&a[b]=2')).toThrow(FormSyntaxError);
    expect(() => parseBracketedForm('metadata[__proto__][x]=1')).toThrow(FormSyntaxError);
  });
});
