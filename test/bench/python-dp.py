#!/usr/bin/env python3
"""A plain transfer-matrix DP for Knutson-Tao puzzles, standard library only: the yardstick of
test/bench (never a check value). Written from the published rule: unit triangles labelled 0, 1 and
10 on their edges (cohomology), plus the K-theory triangle of weight -1 or the equivariant rhombus of
weight y_j - y_i. One DP per boundary; states are dictionaries keyed by tuples of edge labels.

Usage (prints one JSON line):
  python-dp.py count THEORY s1,s2,s3,s4,s5,s6        value of one boundary ('-' is an empty side)
  python-dp.py family THEORY 'a,b,c,d,e,f;...' I J    every labeling in which opposite sides of equal
                                                       length have equal content; checks that
                                                       exchanging sides I and J keeps the value,
                                                       one open-bottom DP per top part
  python-dp.py plain THEORY 'a,b,c,d,e,f;...' I J     the same family and claim, the plain loop: one
                                                       closed DP for b and one for T(b) per labeling
"""
import itertools
import json
import sys
import time
import resource

ZERO, ONE, TEN, EQ = '0', '1', '10', 'eq'


def pieces_of(theory):
    """(orientation, (a, b, c), weight) with labels clockwise: up = left, right, bottom; down = top, right, left."""
    out = []
    for o in ('up', 'down'):
        out.append((o, (ZERO, ZERO, ZERO), 1))
        out.append((o, (ONE, ONE, ONE), 1))
        for r in range(3):
            t = (ZERO, TEN, ONE)
            out.append((o, t[r:] + t[:r], 1))
    if theory == 'k-theory':
        out.append(('up', (TEN, TEN, TEN), -1))
    if theory == 'dual-k-theory':
        out.append(('down', (TEN, TEN, TEN), -1))
    if theory == 'equivariant':
        out.append(('up', (ZERO, ONE, EQ), 1))
        out.append(('down', (EQ, ZERO, ONE), 'position'))
    return out


# Values: ints, or polynomials as {exponent tuple: coefficient}.
def padd(a, b):
    if isinstance(a, int):
        return a + b
    r = dict(a)
    for k, c in b.items():
        s = r.get(k, 0) + c
        if s:
            r[k] = s
        else:
            r.pop(k, None)
    return r


def pmul(a, b):
    if isinstance(a, int):
        return a * b
    r = {}
    for ka, ca in a.items():
        for kb, cb in b.items():
            k = tuple(x + y for x, y in zip(ka, kb))
            s = r.get(k, 0) + ca * cb
            if s:
                r[k] = s
            else:
                r.pop(k, None)
    return r


def is_zero(a):
    return a == 0 if isinstance(a, int) else not a


class Puzzle:
    def __init__(self, theory, lengths):
        self.theory = theory
        self.lengths = lengths
        s1, s2, s3, s4, s5, s6 = lengths
        self.n = s6 + s1 + s2
        self.poly = theory == 'equivariant'
        n = self.n
        self.one = {(0,) * n: 1} if self.poly else 1
        self.up = {}
        self.down = {}
        for o, labels, w in pieces_of(theory):
            if o == 'up':
                self.up.setdefault(labels[0], []).append((labels[1], labels[2], w))  # left -> (right, bottom)
            else:
                self.down.setdefault((labels[0], labels[2]), []).append((labels[1], w))  # (top, left) -> right

    def weight(self, w, x, y):
        if w != 'position':
            return w if not self.poly else {(0,) * self.n: w}
        i, j = x + 1, x + y + 2  # the rhombus's strips meet bottom edges i < j
        a = [0] * self.n
        b = [0] * self.n
        a[j - 1] = 1
        b[i - 1] = 1
        return {tuple(a): 1, tuple(b): -1}

    def inside(self, pts):
        s1, s2, s3, s4, s5, s6 = self.lengths
        n = self.n
        return all(x >= 0 and y >= 0 and x + y <= n and x + y >= s6 and y <= n - s2 and x <= n - s4 for x, y in pts)

    def row(self, y):
        tris = []
        for x in range(-1, self.n + 1):
            if self.inside([(x, y), (x + 1, y), (x, y + 1)]):
                tris.append(('up', x))
            if self.inside([(x + 1, y), (x, y + 1), (x + 1, y + 1)]):
                tris.append(('down', x))
        return tris

    def side_edges(self):
        s1, s2, s3, s4, s5, s6 = self.lengths
        n = self.n
        return [
            [('r', 0, s6 + k) for k in range(s1)],
            [('h', k, n - s2) for k in range(s2)],
            [('l', s2 + k, n - s2 - k - 1) for k in range(s3)],
            [('r', n - s4, s4 - k - 1) for k in range(s4)],
            [('h', n - s4 - k - 1, 0) for k in range(s5)],
            [('l', s6 - k - 1, k) for k in range(s6)],
        ]

    def sweep(self, sides, bottom_open):
        """Top-down DP; returns {bottom line (left to right): value}."""
        fixed = {}
        for edges, s in zip(self.side_edges(), sides):
            if s is None:
                continue
            for e, c in zip(edges, s):
                fixed[e] = c
        top = self.n - self.lengths[1]
        line = tuple(fixed[('h', x, top)] for x in sorted(x for (d, x, y) in fixed if d == 'h' and y == top))
        state = {line: self.one}
        for y in range(top - 1, -1, -1):
            tris = self.row(y)
            first, last = tris[0], tris[-1]
            left = fixed[('r', first[1], y)] if first[0] == 'up' else fixed[('l', first[1], y)]
            # profile: (bottoms placed, tops pending, slant)
            cur = {}
            for ln, v in state.items():
                cur[((), ln, left)] = v
            for o, x in tris:
                nxt = {}
                for (bots, tops, slant), v in cur.items():
                    if o == 'up':
                        want = fixed.get(('h', x, y)) if y == 0 and not bottom_open else None
                        for right, bottom, w in self.up.get(slant, ()):
                            if want is not None and bottom != want:
                                continue
                            if y == 0 and bottom not in (ZERO, ONE):
                                continue
                            nv = v if w == 1 else pmul(v, self.weight(w, x, y))
                            k = (bots + (bottom,), tops, right)
                            nxt[k] = padd(nxt[k], nv) if k in nxt else nv
                    else:
                        for right, w in self.down.get((tops[0], slant), ()):
                            nv = v if w == 1 else pmul(v, self.weight(w, x, y))
                            k = (bots, tops[1:], right)
                            nxt[k] = padd(nxt[k], nv) if k in nxt else nv
                cur = {k: v for k, v in nxt.items() if not is_zero(v)}
            right_label = fixed[('l', last[1], y)] if last[0] == 'up' else fixed[('r', last[1] + 1, y)]
            state = {}
            for (bots, tops, slant), v in cur.items():
                if slant == right_label:
                    state[bots] = padd(state[bots], v) if bots in state else v
        return state

    def count(self, sides):
        bottom = tuple(reversed(sides[4]))
        return self.sweep(sides, False).get(bottom, 0 if not self.poly else {})

    def completions(self, sides):
        """{side-5 string (clockwise): value} from one open-bottom sweep."""
        return {''.join(reversed(k)): v for k, v in self.sweep(list(sides[:4]) + [None, sides[5]], True).items()}


def strings(length, ones=None):
    for bits in itertools.product('01', repeat=length):
        if ones is None or bits.count('1') == ones:
            yield ''.join(bits)


def contents_of(lengths, k):
    """Contents (numbers of 1s) to loop over for sides k and k+3: all when they are tied (equal lengths),
    else one pass (their strings are then every string, whatever the content)."""
    return range(lengths[k] + 1) if lengths[k] == lengths[k + 3] else [0]


def main():
    start = time.perf_counter()
    mode, theory, spec = sys.argv[1], sys.argv[2], sys.argv[3]
    if mode == 'count':
        sides = ['' if s == '-' else s for s in spec.split(',')]
        p = Puzzle(theory, [len(s) for s in sides])
        v = p.count(sides)
        value = v if isinstance(v, int) else len(v)
        out = {'value': str(value) if isinstance(v, int) else None, 'terms': None if isinstance(v, int) else value}
    elif mode == 'plain':
        i, j = int(sys.argv[4]) - 1, int(sys.argv[5]) - 1
        checked = holds = 0
        for shape in spec.split(';'):
            lengths = [int(x) for x in shape.split(',')]
            p = Puzzle(theory, lengths)
            for c0 in contents_of(lengths, 0):
                for c1 in contents_of(lengths, 1):
                    for c2 in contents_of(lengths, 2):
                        contents = [c0, c1, c2, c0, c1, c2]
                        choices = [list(strings(lengths[k], contents[k] if lengths[k] == lengths[(k + 3) % 6] else None)) for k in range(6)]
                        for sides in itertools.product(*choices):
                            other = list(sides)
                            other[i], other[j] = sides[j], sides[i]
                            checked += 1
                            if p.count(list(sides)) == p.count(other):
                                holds += 1
        out = {'checked': checked, 'holds': holds}
    else:
        i, j = int(sys.argv[4]) - 1, int(sys.argv[5]) - 1
        checked = holds = 0
        for shape in spec.split(';'):
            lengths = [int(x) for x in shape.split(',')]
            p = Puzzle(theory, lengths)
            cache = {}

            def completions(sides):
                key = tuple(sides)
                if key not in cache:
                    if len(cache) > 4096:
                        cache.clear()
                    cache[key] = p.completions(sides)
                return cache[key]

            # Sides k and k+3 have equal content (equal numbers of 1s).
            for c0 in contents_of(lengths, 0):
                for c1 in contents_of(lengths, 1):
                    for c2 in contents_of(lengths, 2):
                        contents = [c0, c1, c2, c0, c1, c2]
                        choices = [list(strings(lengths[k], contents[k] if lengths[k] == lengths[(k + 3) % 6] else None)) for k in range(6)]
                        for top in itertools.product(choices[0], choices[1], choices[2], choices[3], choices[5]):
                            sides = [top[0], top[1], top[2], top[3], None, top[4]]
                            other = list(sides)
                            other[i], other[j] = sides[j], sides[i]
                            vb, vt = completions(sides), completions(other)
                            for s5 in choices[4]:
                                checked += 1
                                if vb.get(s5, 0) == vt.get(s5, 0):
                                    holds += 1
        out = {'checked': checked, 'holds': holds}
    out['ms'] = round((time.perf_counter() - start) * 1000, 1)
    out['maxRssMB'] = round(resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024)
    print(json.dumps(out))


if __name__ == '__main__':
    main()
