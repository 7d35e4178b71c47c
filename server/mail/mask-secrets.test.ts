import { describe, expect, it } from 'vitest';
import { HIDDEN_SECRET, maskSecrets } from './mask-secrets';

describe('maskSecrets', () => {
  const link = 'http://127.0.0.1:3000/set-password?token=abc_DEF-123';

  it('replaces every copy of each secret and leaves the rest of the text as it was', () => {
    const text = `Hello,\n\n${link}\n\nor paste ${link} into the browser.`;
    expect(maskSecrets(text, [link])).toBe(`Hello,\n\n${HIDDEN_SECRET}\n\nor paste ${HIDDEN_SECRET} into the browser.`);
  });

  it('takes secrets with characters a pattern would treat specially literally', () => {
    expect(maskSecrets('a.b*c a.b*c abc', ['a.b*c'])).toBe(`${HIDDEN_SECRET} ${HIDDEN_SECRET} abc`);
  });

  it('ignores an empty secret and text without any', () => {
    expect(maskSecrets('nothing to hide', ['', 'absent'])).toBe('nothing to hide');
  });
});
