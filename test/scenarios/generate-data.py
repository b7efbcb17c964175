#!/usr/bin/env python3
"""Writes the invented CSV data of the scenario folders (run from this folder: python3 generate-data.py).

Deterministic (random.seed). Descriptors, settings and expect.json are written by hand; see README.md.
"""
import math
import os
import random

random.seed(5)


def csv(path, header, rows):
    os.makedirs(os.path.dirname(path), exist_ok=True)
    with open(path, 'w') as f:
        f.write(','.join(header) + '\n')
        for r in rows:
            f.write(','.join(repr(round(v, 6)) for v in r) + '\n')


# within-limits: a noisy straight line, plenty of rows
csv('within-limits/data/train.csv', ['x', 'y'], [(x, 2.0 + 0.5 * x + random.gauss(0, 0.3)) for x in [i * 0.25 for i in range(80)]])
csv('within-limits/data/holdout.csv', ['x', 'y'], [(x, 2.0 + 0.5 * x + random.gauss(0, 0.3)) for x in [0.1 + i * 0.5 for i in range(30)]])

# interpolation: six rows, degree five raw powers, p = n
xs = [0, 1, 2, 3, 4, 5]
csv('interpolation/data/train.csv', ['t', 'v'], [(x, math.sin(x) + 0.1 * random.gauss(0, 1)) for x in xs])
csv('interpolation/data/holdout.csv', ['t', 'v'], [(x + 0.5, math.sin(x + 0.5)) for x in xs])

# more-params-than-rows: a radial bump at every sample plus an intercept
xs = [0.5, 1.2, 2.0, 2.9, 3.3, 4.1, 5.0, 5.8]
csv('more-params-than-rows/data/train.csv', ['x', 'y'], [(x, math.cos(x) + 0.05 * random.gauss(0, 1)) for x in xs])
csv('more-params-than-rows/data/holdout.csv', ['x', 'y'], [(x + 0.3, math.cos(x + 0.3)) for x in xs])

# one-bad-model: data of the good model
csv('one-bad-model/data/train.csv', ['x', 'y'], [(x, 1.0 - 0.2 * x + random.gauss(0, 0.2)) for x in [i * 0.2 for i in range(60)]])
csv('one-bad-model/data/holdout.csv', ['x', 'y'], [(x, 1.0 - 0.2 * x + random.gauss(0, 0.2)) for x in [0.05 + i * 0.4 for i in range(20)]])

# warn-band: hold-out noise a little larger than training noise, so the gap ratio lands between limits
csv('warn-band/data/train.csv', ['x', 'y'], [(x, 0.3 * x + random.gauss(0, 0.2)) for x in [i * 0.1 for i in range(100)]])
csv('warn-band/data/holdout.csv', ['x', 'y'], [(x, 0.3 * x + random.gauss(0, 0.3)) for x in [0.037 + i * 0.25 for i in range(40)]])
