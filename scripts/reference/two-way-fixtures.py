#!/usr/bin/env python3
"""Reference fixtures for Seamline's dsp tests: random two-way systems evaluated with scipy.signal (reference library).

Each path is an analog transfer function B(s)/A(s) built from scipy.signal.butter (Linkwitz-Riley as a Butterworth of
half the order, squared) times a speaker roll-off, evaluated with scipy.signal.freqs, times gain, polarity and
e^(-j w tau) with tau = delayMs/1000 + distanceM / (331.3*sqrt(1 + T/273.15)). Group delay comes from the polynomial
derivatives: tau_g = -Im(H'(w)/H(w)), H' = sum_k H_k * j*(B_k'/B_k - A_k'/A_k - tau_k) evaluated at s = jw.

Run: python3 scripts/reference/two-way-fixtures.py > tests/dsp/fixtures/two-way-systems.json
"""
import json
import sys

import numpy as np
import scipy
from scipy import signal

SEED = 20240611
COUNT = 64


def butter_ba(order, corner_hz, btype):
    return signal.butter(order, 2 * np.pi * corner_hz, btype=btype, analog=True)


def filter_ba(family, order, response, corner_hz):
    if response == 'none':
        return np.array([1.0]), np.array([1.0])
    btype = 'low' if response == 'lowpass' else 'high'
    if family == 'butterworth':
        return butter_ba(order, corner_hz, btype)
    b, a = butter_ba(order // 2, corner_hz, btype)
    return np.polymul(b, b), np.polymul(a, a)


def rolloff_ba(rolloff):
    kind = rolloff['kind']
    if kind == 'none':
        return np.array([1.0]), np.array([1.0])
    w0 = 2 * np.pi * rolloff['cornerHz']
    if kind == 'vented':
        return butter_ba(4, rolloff['cornerHz'], 'high')
    a = np.array([1.0, w0 / rolloff['q'], w0 * w0])
    if kind == 'sealed':
        return np.array([1.0, 0.0, 0.0]), a
    return np.array([w0 * w0]), a


def random_filter(rng, response):
    if rng.random() < 0.5:
        return {'family': 'butterworth', 'order': int(rng.integers(1, 9)), 'response': response,
                'cornerHz': float(np.round(rng.uniform(40, 200), 3))}
    return {'family': 'linkwitz-riley', 'order': int(rng.choice([2, 4, 8])), 'response': response,
            'cornerHz': float(np.round(rng.uniform(40, 200), 3))}


def random_rolloff(rng, for_sub):
    pick = rng.integers(0, 3)
    if pick == 0:
        return {'kind': 'none'}
    if for_sub:
        return {'kind': 'lowpass', 'cornerHz': float(np.round(rng.uniform(120, 400), 3)),
                'q': float(np.round(rng.uniform(0.5, 1.2), 4))}
    if pick == 1:
        return {'kind': 'sealed', 'cornerHz': float(np.round(rng.uniform(30, 90), 3)),
                'q': float(np.round(rng.uniform(0.5, 1.2), 4))}
    return {'kind': 'vented', 'cornerHz': float(np.round(rng.uniform(30, 70), 3))}


def path_response(path, w, speed):
    """A path's H(w) and dH/dw: its crossover filter times every roll-off of its 'rolloff' (one, or a list), then gain,
    polarity and e^(-j w tau)."""
    f = path['filter']
    b, a = filter_ba(f['family'], f['order'], f['response'], f['cornerHz'])
    rolloffs = path.get('rolloff', {'kind': 'none'})
    for rolloff in rolloffs if isinstance(rolloffs, list) else [rolloffs]:
        rb, ra = rolloff_ba(rolloff)
        b, a = np.polymul(b, rb), np.polymul(a, ra)
    _, h = signal.freqs(b, a, worN=w)
    tau = path['delayMs'] / 1000 + path.get('distanceM', 0.0) / speed
    gain = 10 ** (path['gainDb'] / 20) * (-1 if path['invert'] else 1)
    s = 1j * w
    # d ln H / d w = j * (B'/B - A'/A)(jw) - j*tau
    dlog = 1j * (np.polyval(np.polyder(b), s) / np.polyval(b, s) - np.polyval(np.polyder(a), s) / np.polyval(a, s)) - 1j * tau
    hk = gain * h * np.exp(-1j * w * tau)
    return hk, hk * dlog


def sum_curves(paths, w, speed):
    """The complex sum of the paths as the fixtures store it (magnitude dB, phase deg, group delay -Im(S'/S) in ms),
    and the last path's own H."""
    total = np.zeros_like(w, dtype=complex)
    total_d = np.zeros_like(w, dtype=complex)
    hk = None
    for path in paths:
        hk, dk = path_response(path, w, speed)
        total += hk
        total_d += dk
    group_ms = -np.imag(total_d / total) * 1000
    return {
        'magnitudeDb': [float(x) for x in 20 * np.log10(np.abs(total))],
        'phaseDeg': [float(x) for x in np.angle(total, deg=True)],
        'groupDelayMs': [float(x) for x in group_ms],
    }, hk


def fixture_grid():
    """The fixtures' frequencies, Hz (10 Hz to 20 kHz at 12 points per octave), and w = 2*pi*f."""
    freq = 10.0 * 2.0 ** (np.arange(0, int(np.floor(np.log2(20000 / 10) * 12)) + 1) / 12)
    return freq, 2 * np.pi * freq


def random_air(rng):
    """A random air temperature, deg C (5 to 35), and its speed of sound, m/s (Kinsler et al. 2000)."""
    temperature_c = float(np.round(rng.uniform(5, 35), 2))
    return temperature_c, 331.3 * np.sqrt(1 + temperature_c / 273.15)


def main():
    rng = np.random.default_rng(SEED)
    freq, w = fixture_grid()
    systems = []
    for k in range(COUNT):
        temperature_c, speed = random_air(rng)
        paths = []
        for role, response in (('mains', 'highpass'), ('sub', 'lowpass')):
            path = {'name': role, 'filter': random_filter(rng, response),
                    'gainDb': float(np.round(rng.uniform(-6, 6), 3)),
                    'delayMs': float(np.round(rng.uniform(0, 10), 4)),
                    'invert': bool(rng.random() < 0.5)}
            if k % 8 == 7:
                path['filter'] = dict(path['filter'], response='none')
            rolloff = random_rolloff(rng, role == 'sub')
            if rolloff['kind'] != 'none' or rng.random() < 0.5:
                path['rolloff'] = rolloff
            if rng.random() < 0.7:
                path['distanceM'] = float(np.round(rng.uniform(0.5, 6), 3))
            paths.append(path)
        systems.append({'temperatureC': temperature_c, 'paths': paths, 'sum': sum_curves(paths, w, speed)[0]})
    json.dump({'source': 'scipy.signal.freqs ' + scipy.__version__ + ', numpy ' + np.__version__,
               'generator': 'scripts/reference/two-way-fixtures.py', 'seed': SEED,
               'frequencyHz': [float(x) for x in freq], 'systems': systems}, sys.stdout, separators=(',', ':'))


if __name__ == '__main__':
    main()
