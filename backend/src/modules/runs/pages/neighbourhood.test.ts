import { describe, expect, it } from 'vitest';
import { distancesFrom, keepTopNodes } from './neighbourhood.js';

describe('neighbourhood', () => {
  it('measures steps either way along links and ignores edges three steps out', () => {
    const first: [number, number][] = [
      [1, 0],
      [0, 2],
    ];
    const second: [number, number][] = [
      [1, 0],
      [3, 1],
      [2, 4],
      [0, 2],
      [5, 6],
    ];
    expect([...distancesFrom(0, first, second)].sort((a, b) => a[0] - b[0])).toEqual([
      [0, 0],
      [1, 1],
      [2, 1],
      [3, 2],
      [4, 2],
    ]);
  });

  it('keeps the centre and the highest-score nodes', () => {
    const scores = new Map([
      [0, 0.01],
      [1, 0.5],
      [2, 0.2],
      [3, 0.3],
    ]);
    expect([...keepTopNodes(0, scores, 3)]).toEqual([0, 1, 3]);
  });
});
