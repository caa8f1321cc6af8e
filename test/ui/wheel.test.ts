import { describe, expect, it } from 'vitest';
import { wheelIntent } from '../../src/lib/ui/sheet/wheel';

const base = {
  deltaX: 0,
  deltaY: 0,
  deltaMode: 0,
  ctrlKey: false,
  metaKey: false,
  shiftKey: false,
};

describe('wheel intent', () => {
  it('pinch (ctrl + wheel) zooms', () => {
    expect(wheelIntent({ ...base, deltaY: 3.5, ctrlKey: true })).toEqual({
      kind: 'zoom',
      deltaY: 3.5,
    });
  });
  it('a mouse wheel step zooms; line mode is scaled to pixels', () => {
    expect(wheelIntent({ ...base, deltaY: 100 })).toEqual({ kind: 'zoom', deltaY: 100 });
    expect(wheelIntent({ ...base, deltaY: 3, deltaMode: 1 })).toEqual({ kind: 'zoom', deltaY: 48 });
  });
  it('a two-finger trackpad scroll pans', () => {
    expect(wheelIntent({ ...base, deltaX: 4, deltaY: -7.5 })).toEqual({
      kind: 'pan',
      dx: -4,
      dy: 7.5,
    });
  });
  it('shift + wheel pans sideways', () => {
    expect(wheelIntent({ ...base, deltaY: 100, shiftKey: true })).toEqual({
      kind: 'pan',
      dx: -100,
      dy: 0,
    });
  });
});
