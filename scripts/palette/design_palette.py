#!/usr/bin/env python3
"""Designs Sublevel's diagram palette from scratch (run: python3 scripts/palette/design_palette.py).

Candidates: in-gamut sRGB colours on a CIELAB grid whose relative luminance lies between 0.15
and 0.29, so every one has at least 3:1 WCAG contrast (graphics, WCAG 2.1 SC 1.4.11) against
both a light (#fbfbf8) and a dark (#1e1f22) editor background: one palette serves both themes.
Colours are then picked greedily to maximise the smallest CIE76 distance between any two of
them, taken over normal vision and the three dichromacies simulated with the severity-1.0
matrices of Machado, Oliveira & Fernandes (2009), doi:10.1109/TVCG.2009.113, applied in
linear sRGB. tests/render/palette.test.ts re-checks the chosen hex values the same way.
"""
import itertools
import numpy as np

M = {
    'protan': np.array([[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]]),
    'deutan': np.array([[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.011820, 0.042940, 0.968881]]),
    'tritan': np.array([[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.303900]]),
}
XYZ = np.array([[0.4124, 0.3576, 0.1805], [0.2126, 0.7152, 0.0722], [0.0193, 0.1192, 0.9505]])
WHITE = XYZ @ np.ones(3)


def to_linear(c):
    c = np.asarray(c, float)
    return np.where(c <= 0.04045, c / 12.92, ((c + 0.055) / 1.055) ** 2.4)


def from_linear(l):
    l = np.clip(l, 0, 1)
    return np.where(l <= 0.0031308, 12.92 * l, 1.055 * l ** (1 / 2.4) - 0.055)


def lab(lin):
    t = (XYZ @ lin) / WHITE
    f = np.where(t > (6 / 29) ** 3, np.cbrt(t), t / (3 * (6 / 29) ** 2) + 4 / 29)
    return np.array([116 * f[1] - 16, 500 * (f[0] - f[1]), 200 * (f[1] - f[2])])


def lab_to_lin(L, a, b):
    fy = (L + 16) / 116
    f = np.array([fy + a / 500, fy, fy - b / 200])
    t = np.where(f > 6 / 29, f ** 3, 3 * (6 / 29) ** 2 * (f - 4 / 29))
    return np.linalg.solve(XYZ, t * WHITE)


def views(lin):
    return [lab(lin)] + [lab(np.clip(m @ lin, 0, 1)) for m in M.values()]


def distance(v1, v2):
    return min(np.linalg.norm(a - b) for a, b in zip(v1, v2))


cands = []
for L in np.arange(47, 61, 2.0):
    for h in np.arange(0, 360, 6):
        for C in np.arange(30, 95, 8):
            lin = lab_to_lin(L, C * np.cos(np.radians(h)), C * np.sin(np.radians(h)))
            if np.all(lin >= 0) and np.all(lin <= 1):
                y = 0.2126 * lin[0] + 0.7152 * lin[1] + 0.0722 * lin[2]
                if 0.15 <= y <= 0.29:
                    srgb = np.round(from_linear(lin) * 255).astype(int)
                    cands.append(('#%02x%02x%02x' % tuple(srgb), views(to_linear(srgb / 255))))

# Start from the candidate most unlike a neutral grey, then add the farthest one each time.
grey = views(to_linear(np.array([0.45, 0.45, 0.45])))
picked = [max(cands, key=lambda c: distance(c[1], grey))]
while len(picked) < 8:
    picked.append(max(cands, key=lambda c: min(distance(c[1], p[1]) for p in picked)))
for name, v in picked:
    print(name, round(min(distance(v, p[1]) for p in picked if p[0] != name), 1))
print('min pair', round(min(distance(a[1], b[1]) for a, b in itertools.combinations(picked, 2)), 1))
