#!/usr/bin/env python3
"""Makes the malformed G-EQDSK files of this folder from valid-17x17.geqdsk (see README.md)."""
import os

HERE = os.path.dirname(os.path.abspath(__file__))
BASE = open(os.path.join(HERE, "valid-17x17.geqdsk")).read().split("\n")
N = 17
# first line of each block in the valid file (1-based), five 16-character numbers a line
SCALARS, FPOL, PRES, PSIRZ, QPSI, COUNTS, BOUNDARY, LIMITER = 2, 6, 10, 22, 80, 84, 85, 137


def put(lines, first, index, text):
    """Replaces value `index` (0-based) of the block starting at line `first` by `text` (16 wide)."""
    row, col = first - 1 + index // 5, (index % 5) * 16
    s = lines[row]
    lines[row] = s[:col] + text.rjust(16) + s[col + 16:]


def make(name, edit):
    lines = list(BASE)
    result = edit(lines)
    lines = result if isinstance(result, list) else lines
    with open(os.path.join(HERE, name), "w") as f:
        f.write("\n".join(lines))


make("01-truncated-in-psirz.geqdsk", lambda l: l[:50])
make("02-grid-size-too-small.geqdsk", lambda l: [l[0][:52] + "%4d%4d" % (N, N - 1)] + l[1:])
make("03-grid-size-too-large.geqdsk", lambda l: [l[0][:52] + "%4d%4d" % (N + 1, N)] + l[1:])
make("04-nan-in-fpol.geqdsk", lambda l: put(l, FPOL, 5, "NaN"))
make("05-text-in-pres.geqdsk", lambda l: put(l, PRES, 1, "not-a-number"))
make("06-negative-nw.geqdsk", lambda l: [l[0][:52] + "%4d%4d" % (-N, N)] + l[1:])
make("07-flat-psi.geqdsk", lambda l: (put(l, SCALARS, 8, l[SCALARS][32:48]), put(l, SCALARS, 17, l[SCALARS][32:48])))
# a bump on the midplane row (Z = 0, row 8) between the axis (R = 1.77 m) and the outer boundary (2.2 m)
make("08-non-monotonic-psi.geqdsk", lambda l: put(l, PSIRZ, 8 * N + 11, "3.000000000E-01"))
make("09-missing-limiter-counts.geqdsk", lambda l: l[:COUNTS - 1])
make("10-negative-limiter-count.geqdsk", lambda l: l[:COUNTS - 1] + ["  129   -5"] + l[COUNTS:])
make("11-limiter-truncated.geqdsk", lambda l: l[:-10])
make("12-axis-outside-limiter.geqdsk", lambda l: (put(l, SCALARS, 5, "1.100000000E+00"), put(l, SCALARS, 13, "1.100000000E+00")))
make("13-boundary-off-grid.geqdsk", lambda l: put(l, BOUNDARY, 20, "3.000000000E+00"))
make("14-infinite-in-psirz.geqdsk", lambda l: put(l, PSIRZ, 40, "1.0E+999"))
make("15-zero-rdim.geqdsk", lambda l: put(l, SCALARS, 0, "0.000000000E+00"))
make("16-empty.geqdsk", lambda l: [""])
make("17-fpol-changes-sign.geqdsk", lambda l: put(l, FPOL, 9, "-4.000000000E+00"))
make("18-header-without-sizes.geqdsk", lambda l: ["twinorbit solovev cocos 1"] + l[1:])
