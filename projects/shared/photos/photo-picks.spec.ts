import { HttpErrorResponse } from '@angular/common/http';
import { describe, expect, it } from 'vitest';
import { photoProblemText, screenPick, thumbnailWidth, uploadPercent } from './photo-picks';

const file = (name: string, size: number) => new File([new Uint8Array(size)], name, { type: 'image/jpeg' });

describe('screenPick', () => {
  it('keeps files within the size, in the order chosen', () => {
    const picked = screenPick([file('a.jpg', 10), file('b.jpg', 20)], 20);
    expect(picked.accepted.map((f) => f.name)).toEqual(['a.jpg', 'b.jpg']);
    expect(picked.refusals).toEqual([]);
  });

  it('names each file that is too large', () => {
    const picked = screenPick([file('big.jpg', 3 * 1024 * 1024), file('ok.jpg', 1)], 2.5 * 1024 * 1024);
    expect(picked.accepted.map((f) => f.name)).toEqual(['ok.jpg']);
    expect(picked.refusals).toEqual([{ key: 'common.photoGallery.tooLarge', params: { name: 'big.jpg', size: '2.5 MB' } }]);
  });

  it('sends only the first few of a large pick and says so', () => {
    const picked = screenPick([file('1.jpg', 1), file('2.jpg', 1), file('3.jpg', 1)], 10, 2);
    expect(picked.accepted.map((f) => f.name)).toEqual(['1.jpg', '2.jpg']);
    expect(picked.refusals).toEqual([{ key: 'common.photoGallery.tooMany', params: { count: 2 } }]);
  });
});

describe('thumbnailWidth', () => {
  it.each([
    // width, height, strip height, expected width
    [640, 480, 120, 160],
    [480, 640, 120, 90],
    [null, 480, 120, 120],
    [640, null, 96, 96],
    [0, 0, 96, 96],
  ])('%s × %s at %s px high is %s px wide', (width, height, strip, expected) => {
    expect(thumbnailWidth({ width, height }, strip)).toBe(expected);
  });
});

describe('uploadPercent', () => {
  it.each([
    [0, 200, 0],
    [50, 200, 25],
    [1, 3, 33],
    [250, 200, 100],
    [10, undefined, null],
    [10, 0, null],
  ])('%s of %s is %s %', (loaded, total, expected) => {
    expect(uploadPercent(loaded, total)).toBe(expected);
  });
});

describe('photoProblemText', () => {
  it('prefers the message about the file', () => {
    const error = new HttpErrorResponse({
      status: 400,
      error: {
        type: 'about:blank',
        title: 'The request has invalid fields',
        status: 400,
        errors: [{ field: 'file', message: 'SVG and HTML files are not accepted.' }],
      },
    });
    expect(photoProblemText(error)).toBe('SVG and HTML files are not accepted.');
  });

  it('falls back to the detail, then the title', () => {
    const conflict = new HttpErrorResponse({
      status: 409,
      error: { type: 'about:blank', title: 'Conflict', status: 409, detail: 'The client approved this board.' },
    });
    expect(photoProblemText(conflict)).toBe('The client approved this board.');
    expect(photoProblemText(new HttpErrorResponse({ status: 0 }))).toBe(
      'Layerbook could not be reached. Check your connection and try again.',
    );
  });
});
