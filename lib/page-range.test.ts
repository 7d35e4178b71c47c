import { describe, expect, it } from 'vitest';
import { firstValues, pageHref, pageRange, rangeText } from './page-range';

describe('pageRange', () => {
  it('numbers the rows of a middle, a last and an empty page', () => {
    expect(pageRange({ total: 250, page: 2, pageSize: 100 }, 100)).toEqual({ first: 101, last: 200, pages: 3 });
    expect(pageRange({ total: 250, page: 3, pageSize: 100 }, 50)).toEqual({ first: 201, last: 250, pages: 3 });
    expect(pageRange({ total: 0, page: 1, pageSize: 100 }, 0)).toEqual({ first: 0, last: 0, pages: 1 });
  });

  it('counts a page past the end as showing nothing', () => {
    expect(pageRange({ total: 10, page: 9, pageSize: 100 }, 0)).toEqual({ first: 0, last: 0, pages: 1 });
  });
});

describe('pageHref', () => {
  it('keeps the filters, drops empty ones and leaves page 1 out', () => {
    expect(pageHref('/orders', { status: 'open', q: '', page: 4 }, 1)).toBe('/orders?status=open');
    expect(pageHref('/orders', { status: 'open', q: 'BO 7&' }, 3)).toBe('/orders?status=open&q=BO+7%26&page=3');
    expect(pageHref('/bins', {}, 1)).toBe('/bins');
  });
});

describe('firstValues', () => {
  it('takes the first of a repeated parameter', () => {
    expect(firstValues({ q: ['a', 'b'], page: '2', x: undefined })).toEqual({ q: 'a', page: '2', x: undefined });
  });
});

describe('rangeText', () => {
  it('says which rows of how many, in the singular for one', () => {
    expect(rangeText({ total: 10000, page: 2, pageSize: 100 }, 100, ['bin', 'bins'], 'No bins.')).toBe('101–200 of 10000 bins');
    expect(rangeText({ total: 1, page: 1, pageSize: 100 }, 1, ['bin', 'bins'], 'No bins.')).toBe('1–1 of 1 bin');
    expect(rangeText({ total: 0, page: 1, pageSize: 100 }, 0, ['bin', 'bins'], 'No bins.')).toBe('No bins.');
  });
});
