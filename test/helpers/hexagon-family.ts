/**
 * The family (a,0,b,a,0,b), 1 ≤ a, b ≤ max, with opposite sides of equal content (sides 1, 4 and 3, 6): the hexagon
 * family that discover's tests and benchmark search.
 */
export function hexagonFamily(max: number) {
  return {
    sides: ['a', 0, 'b', 'a', 0, 'b'],
    variables: [
      { name: 'a', min: 1, max },
      { name: 'b', min: 1, max },
    ],
    conditions: [
      { type: 'sameContent', sides: [1, 4] },
      { type: 'sameContent', sides: [3, 6] },
    ],
  };
}
