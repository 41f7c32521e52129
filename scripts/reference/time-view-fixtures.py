#!/usr/bin/env python3
"""Reference fixtures for Seamline's time views (dsp/time/impulse-from-response.ts): impulse and step responses of
analog low-passes, computed in the time domain by scipy.signal (reference library), independent of any FFT.

Cases (analog prototypes, s-domain, no sampling):
    1. 'lr4-lowpass-80': Linkwitz-Riley 4th-order low-pass at 80 Hz (S. H. Linkwitz, J. Audio Eng. Soc. 24(1), 1976:
       the 2nd-order Butterworth squared): (b, a) = butter(2, 2*pi*80, 'low', analog=True), b and a each convolved
       with themselves.
    2. 'butterworth2-lowpass-120': 2nd-order Butterworth low-pass at 120 Hz (S. Butterworth, 1930):
       butter(2, 2*pi*120, 'low', analog=True).
For each: scipy.signal.impulse and scipy.signal.step on t = 0 ... 300 ms in steps of 1/8000 s (the time view's default
sample rate), stored every 8th sample (1 ms apart) as 'timeMs', 'impulsePerS' (h(t), 1/s) and 'step'; and the peak
time of h(t) found on a 1 us grid over 0 ... 50 ms (numpy.argmax), 'peakMs'.

Pairs (lib/system-model/time-view.ts: a main channel's high-pass and a sub's low-pass, the sub delayed):
    'lr4-pair-80-sub-3ms': the LR4 high-pass and low-pass at 80 Hz (Linkwitz 1976), the low-pass delayed by 3 ms (24
    samples at 8 kHz). scipy.signal.step of each on t = 0 ... 300 ms (the high-pass's step includes its direct term:
    it starts at 1), the low-pass's step shifted by 3 ms (0 before), and their sum; stored every 8th sample (1 ms)
    as 'timeMs', 'mainsStep', 'subStep', 'sumStep'; and the time of the largest |step| of each on a 1 us grid over
    0 ... 50 ms, 'mainsStepPeakMs', 'subStepPeakMs'.

Run: python3 scripts/reference/time-view-fixtures.py > tests/dsp/fixtures/time-view-scipy.json
"""
import json
import math
import sys

import numpy as np
import scipy
from scipy import signal

FS_HZ = 8000
STORE_EVERY = 8


def lr4_lowpass(corner_hz):
    b, a = signal.butter(2, 2 * math.pi * corner_hz, 'low', analog=True)
    return np.convolve(b, b), np.convolve(a, a)


def butterworth2_lowpass(corner_hz):
    return signal.butter(2, 2 * math.pi * corner_hz, 'low', analog=True)


def lr4_highpass(corner_hz):
    b, a = signal.butter(2, 2 * math.pi * corner_hz, 'high', analog=True)
    return np.convolve(b, b), np.convolve(a, a)


def pair(name, description, corner_hz, sub_delay_ms):
    t = np.arange(0, 2401) / FS_HZ  # 0 ... 300 ms
    shift = int(round(sub_delay_ms * FS_HZ / 1000))
    _, mains = signal.step(lr4_highpass(corner_hz), T=t)
    _, sub0 = signal.step(lr4_lowpass(corner_hz), T=t)
    sub = np.concatenate([np.zeros(shift), sub0[:len(t) - shift]])
    fine = np.arange(0, 50001) * 1e-6  # 0 ... 50 ms, 1 us apart
    _, mains_fine = signal.step(lr4_highpass(corner_hz), T=fine)
    _, sub_fine = signal.step(lr4_lowpass(corner_hz), T=fine)
    keep = slice(0, None, STORE_EVERY)
    return {
        'name': name, 'description': description, 'cornerHz': corner_hz, 'subDelayMs': sub_delay_ms,
        'mainsStepPeakMs': float(fine[int(np.argmax(np.abs(mains_fine)))] * 1000),
        'subStepPeakMs': float(fine[int(np.argmax(np.abs(sub_fine)))] * 1000 + sub_delay_ms),
        'timeMs': [float(x) for x in np.round(t[keep] * 1000, 9)],
        'mainsStep': [float(x) for x in np.round(mains[keep], 9)],
        'subStep': [float(x) for x in np.round(sub[keep], 9)],
        'sumStep': [float(x) for x in np.round((mains + sub)[keep], 9)],
    }


def case(name, description, system):
    t = np.arange(0, 2401) / FS_HZ  # 0 ... 300 ms
    _, h = signal.impulse(system, T=t)
    _, y = signal.step(system, T=t)
    fine = np.arange(0, 50001) * 1e-6  # 0 ... 50 ms, 1 us apart
    _, h_fine = signal.impulse(system, T=fine)
    keep = slice(0, None, STORE_EVERY)
    return {
        'name': name, 'description': description,
        'b': [float(x) for x in system[0]], 'a': [float(x) for x in system[1]],
        'peakMs': float(fine[int(np.argmax(h_fine))] * 1000),
        'timeMs': [float(x) for x in np.round(t[keep] * 1000, 9)],
        'impulsePerS': [float(x) for x in np.round(h[keep], 6)],
        'step': [float(x) for x in np.round(y[keep], 9)],
    }


def main():
    out = {
        'source': 'scipy.signal ' + scipy.__version__ + ' (butter analog, impulse, step); numpy ' + np.__version__,
        'generator': 'scripts/reference/time-view-fixtures.py',
        'units': 'timeMs ms; impulsePerS h(t) in 1/s; step dimensionless; peakMs ms (1 us grid)',
        'cases': [
            case('lr4-lowpass-80', 'analog LR4 low-pass at 80 Hz', lr4_lowpass(80.0)),
            case('butterworth2-lowpass-120', 'analog 2nd-order Butterworth low-pass at 120 Hz', butterworth2_lowpass(120.0)),
        ],
        'pairs': [
            pair('lr4-pair-80-sub-3ms', 'analog LR4 high-pass and low-pass at 80 Hz, the low-pass 3 ms late', 80.0, 3.0),
        ],
    }
    json.dump(out, sys.stdout, separators=(',', ':'))


if __name__ == '__main__':
    main()
