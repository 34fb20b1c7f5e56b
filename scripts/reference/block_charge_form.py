"""The field of a uniformly magnetised rectangular block from its surface charge, in mpmath, shared by
the block reference scripts (thin_film_gradient.py, block_gradient_planes.py).

A uniformly magnetised block is its surface charge sigma = M.n on the faces, so (B = mu0 H outside)
  B(x) = (mu0 sigma / 4 pi) sum over faces of the double integral of (x - x') / |x - x'|^3 dA.
Each face's double integral has the textbook closed form (s, t the offsets from the point to the
face's corners along its edges, w to its plane, R = sqrt(s^2 + t^2 + w^2), [[f]] the alternating
sum over the four corners): B_s = c [[ln(t + R)]], B_t = c [[ln(s + R)]], B_w = -c [[atan(st/(wR))]].
thin_film_gradient.py checks it against mpmath quadrature of the surface integral. `mag` is mu0 M in
T, `size` and `centre` in m, each a list of three numbers mpmath reads exactly.
"""
import mpmath as mp


def faces(mag, size, centre):
    """(k, plane, charge in T) of every charged face."""
    for k in range(3):
        if mag[k] != 0:
            yield k, centre[k] + size[k] / 2, mp.mpf(mag[k])
            yield k, centre[k] - size[k] / 2, -mp.mpf(mag[k])


def face_field(k, plane, charge, x, size, centre):
    a, b = (k + 1) % 3, (k + 2) % 3
    w = plane - x[k]
    B = [mp.mpf(0)] * 3
    for i, s in enumerate((centre[a] - size[a] / 2 - x[a], centre[a] + size[a] / 2 - x[a])):
        for j, t in enumerate((centre[b] - size[b] / 2 - x[b], centre[b] + size[b] / 2 - x[b])):
            sign = 1 if i == j else -1
            R = mp.sqrt(s * s + t * t + w * w)
            B[a] += sign * mp.log(t + R)
            B[b] += sign * mp.log(s + R)
            B[k] -= sign * mp.atan(s * t / (w * R))
    c = charge / (4 * mp.pi)
    return [c * v for v in B]


def block_field(mag, x, size, centre):
    B = [mp.mpf(0)] * 3
    for k, plane, charge in faces(mag, size, centre):
        for i, v in enumerate(face_field(k, plane, charge, x, size, centre)):
            B[i] += v
    return B


def gradient_by_diff(mag, x, size, centre):
    """dB_i/dx_j as mpmath.diff of the closed form."""
    g = [[None] * 3 for _ in range(3)]
    for j in range(3):
        def along(h, j=j):
            y = list(x)
            y[j] += h
            return block_field(mag, y, size, centre)
        for i in range(3):
            g[i][j] = mp.diff(lambda h, i=i: along(h)[i], 0)
    return g


def dipole_field(mag, x, size, centre):
    """The point dipole of the block's moment: B = (V / 4 pi) (3 (J.n) n - J) / r^3, J = mu0 M in T."""
    volume = size[0] * size[1] * size[2]
    r = [x[i] - centre[i] for i in range(3)]
    d = mp.sqrt(sum(c * c for c in r))
    n = [c / d for c in r]
    jn = sum(mp.mpf(mag[i]) * n[i] for i in range(3))
    return [volume / (4 * mp.pi) * (3 * jn * n[i] - mp.mpf(mag[i])) / d ** 3 for i in range(3)]


def symmetry_zeros(values, below):
    """The values as floats, with those under `below` times the largest (symmetry zeros at mpmath's precision) written as exactly 0."""
    largest = max(abs(v) for v in values)
    return [0.0 if abs(v) <= below * largest else float(v) for v in values]
