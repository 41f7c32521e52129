#!/usr/bin/env python3
"""Reference fixtures for Seamline's processor filters (digital biquads).

Crossovers (reference library, scipy.signal): every Butterworth order 1-8 and Linkwitz-Riley 2/4/8, low- and high-pass,
at 44100, 48000, 96000 and 192000 Hz, at 80 Hz and three seeded random corners between 20 Hz and 0.2*fs (log-uniform):
    sos = scipy.signal.butter(N, fc, btype, fs=fs, output='sos')    (bilinear transform pre-warped at fc)
    Linkwitz-Riley N = the Butterworth of order N/2 squared (S. H. Linkwitz, J. Audio Eng. Soc. 24(1), 1976): its sos
    stacked twice.
    w, h = scipy.signal.sosfreqz(sos, worN=grid, fs=fs)
on a log grid of POINTS frequencies from 10 Hz to 0.45*fs (one grid per rate, stored in 'grids').

Cookbook cases (worked by the formula in numpy, NOT scipy): R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad
filter coefficients" (W3C Audio EQ Cookbook note, 2021), re-typed here from the cookbook, each divided by a0, and the
response H(e^jw) = (b0 + b1 z^-1 + b2 z^-2) / (1 + a1 z^-1 + a2 z^-2) evaluated directly with numpy on the same grids.

Stored: 'sos' rows [b0, b1, b2, 1, a1, a2] (scipy's convention, a0 = 1) or 'biquad' {b0, b1, b2, a1, a2}; responses as
'magnitudeDb' (20*log10|H|) and 'phaseDeg' WRAPPED to (-180, 180] (numpy.angle), both rounded to 1e-5 (dB, deg): 1 %
of the tests' tolerance, and it keeps the file near half a megabyte.

Run: python3 scripts/reference/processor-filter-fixtures.py > tests/dsp/fixtures/processor-filters-scipy.json
"""
import json
import math
import sys

import numpy as np
import scipy
from scipy import signal

SEED = 20251202
POINTS = 64
RATES_HZ = [44100, 48000, 96000, 192000]
RANDOM_CORNERS = 3
FAMILIES = [('butterworth', n) for n in range(1, 9)] + [('linkwitz-riley', n) for n in (2, 4, 8)]


def grid_hz(fs):
    return np.geomspace(10.0, 0.45 * fs, POINTS)


def crossover_sos(family, order, response, corner_hz, fs):
    btype = 'lowpass' if response == 'lowpass' else 'highpass'
    if family == 'butterworth':
        return signal.butter(order, corner_hz, btype, fs=fs, output='sos')
    half = signal.butter(order // 2, corner_hz, btype, fs=fs, output='sos')
    return np.vstack([half, half])


def rounded(values, decimals=5):
    return [float(x) for x in np.round(values, decimals)]


def wrapped_deg(h):
    deg = np.angle(h, deg=True)
    return np.where(deg <= -180.0, deg + 360.0, deg)


def curves(h):
    return {'magnitudeDb': rounded(20 * np.log10(np.abs(h))), 'phaseDeg': rounded(wrapped_deg(h))}


def crossover_cases(rng):
    cases = []
    for fs in RATES_HZ:
        randoms = np.exp(rng.uniform(math.log(20.0), math.log(0.2 * fs), RANDOM_CORNERS))
        corners = [80.0] + [float(np.round(c, 3)) for c in randoms]
        grid = grid_hz(fs)
        for corner_hz in corners:
            for family, order in FAMILIES:
                for response in ('lowpass', 'highpass'):
                    sos = crossover_sos(family, order, response, corner_hz, fs)
                    _, h = signal.sosfreqz(sos, worN=grid, fs=fs)
                    case = {'sampleRateHz': fs,
                            'filter': {'kind': 'crossover', 'family': family, 'order': order, 'response': response,
                                       'cornerHz': corner_hz},
                            'sos': [[float(x) for x in row] for row in sos]}
                    case.update(curves(h))
                    cases.append(case)
    return cases


# ---- the Audio EQ Cookbook, re-typed from the cookbook (not from Seamline's code) ----

def cookbook(kind, f0, fs, gain_db=0.0, q=None, slope=None):
    a_lin = 10 ** (gain_db / 40)
    w0 = 2 * math.pi * f0 / fs
    cw, sw = math.cos(w0), math.sin(w0)
    if q is not None:
        alpha = sw / (2 * q)
    else:  # shelf slope S
        alpha = sw / 2 * math.sqrt((a_lin + 1 / a_lin) * (1 / slope - 1) + 2)
    sa = 2 * math.sqrt(a_lin) * alpha
    if kind == 'peaking':
        b = [1 + alpha * a_lin, -2 * cw, 1 - alpha * a_lin]
        a = [1 + alpha / a_lin, -2 * cw, 1 - alpha / a_lin]
    elif kind == 'low-shelf':
        b = [a_lin * ((a_lin + 1) - (a_lin - 1) * cw + sa), 2 * a_lin * ((a_lin - 1) - (a_lin + 1) * cw),
             a_lin * ((a_lin + 1) - (a_lin - 1) * cw - sa)]
        a = [(a_lin + 1) + (a_lin - 1) * cw + sa, -2 * ((a_lin - 1) + (a_lin + 1) * cw),
             (a_lin + 1) + (a_lin - 1) * cw - sa]
    elif kind == 'high-shelf':
        b = [a_lin * ((a_lin + 1) + (a_lin - 1) * cw + sa), -2 * a_lin * ((a_lin - 1) + (a_lin + 1) * cw),
             a_lin * ((a_lin + 1) + (a_lin - 1) * cw - sa)]
        a = [(a_lin + 1) - (a_lin - 1) * cw + sa, 2 * ((a_lin - 1) - (a_lin + 1) * cw),
             (a_lin + 1) - (a_lin - 1) * cw - sa]
    elif kind == 'allpass':
        b = [1 - alpha, -2 * cw, 1 + alpha]
        a = [1 + alpha, -2 * cw, 1 - alpha]
    else:
        raise ValueError(kind)
    return {'b0': b[0] / a[0], 'b1': b[1] / a[0], 'b2': b[2] / a[0], 'a1': a[1] / a[0], 'a2': a[2] / a[0]}


def biquad_response(bq, grid, fs):
    zi = np.exp(-1j * 2 * np.pi * grid / fs)  # z^-1
    return (bq['b0'] + bq['b1'] * zi + bq['b2'] * zi * zi) / (1 + bq['a1'] * zi + bq['a2'] * zi * zi)


COOKBOOK_CASES = [
    ({'kind': 'peaking', 'centerHz': 1000, 'gainDb': 6, 'q': 1}, 48000),
    ({'kind': 'peaking', 'centerHz': 45, 'gainDb': -9.5, 'q': 4.3}, 44100),
    ({'kind': 'peaking', 'centerHz': 12500, 'gainDb': 3, 'q': 0.7}, 96000),
    ({'kind': 'low-shelf', 'cornerHz': 120, 'gainDb': 4, 'q': 0.8}, 48000),
    ({'kind': 'low-shelf', 'cornerHz': 300, 'gainDb': -6, 'slope': 0.5}, 44100),
    ({'kind': 'low-shelf', 'cornerHz': 60, 'gainDb': 10, 'slope': 1}, 192000),
    ({'kind': 'high-shelf', 'cornerHz': 4000, 'gainDb': -3, 'q': 0.707}, 48000),
    ({'kind': 'high-shelf', 'cornerHz': 8000, 'gainDb': 2.5, 'slope': 0.8}, 96000),
    ({'kind': 'high-shelf', 'cornerHz': 2500, 'gainDb': -12, 'slope': 1}, 44100),
    ({'kind': 'allpass', 'order': 2, 'cornerHz': 80, 'q': 0.5}, 48000),
    ({'kind': 'allpass', 'order': 2, 'cornerHz': 2000, 'q': 3}, 96000),
]


def cookbook_cases():
    cases = []
    for filt, fs in COOKBOOK_CASES:
        f0 = filt.get('centerHz', filt.get('cornerHz'))
        bq = cookbook('allpass' if filt['kind'] == 'allpass' else filt['kind'], f0, fs, filt.get('gainDb', 0.0),
                      filt.get('q'), filt.get('slope'))
        case = {'sampleRateHz': fs, 'filter': filt, 'biquad': bq}
        case.update(curves(biquad_response(bq, grid_hz(fs), fs)))
        cases.append(case)
    return cases


def main():
    rng = np.random.default_rng(SEED)
    out = {
        'source': 'scipy.signal.butter + sosfreqz ' + scipy.__version__ + ' (crossovers); numpy ' + np.__version__
                  + ' from the Audio EQ Cookbook formulae (cookbook: worked by the formula, not scipy)',
        'generator': 'scripts/reference/processor-filter-fixtures.py', 'seed': SEED,
        'phase': 'wrapped to (-180, 180] degrees',
        'grids': {str(fs): [float(x) for x in grid_hz(fs)] for fs in RATES_HZ},
        'crossovers': crossover_cases(rng),
        'cookbook': cookbook_cases(),
    }
    json.dump(out, sys.stdout, separators=(',', ':'))


if __name__ == '__main__':
    main()
