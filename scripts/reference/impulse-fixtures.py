#!/usr/bin/env python3
"""Reference fixtures for Seamline's impulse response -> complex response (dsp/measured/impulse-to-response.ts).

Two filters sampled at 48 kHz through the bilinear transform (reference library, scipy.signal), each stored as its
second-order sections so the test regenerates the 1 s impulse response itself with a direct-form difference equation
(smaller than storing 48 000 floats per case, and exact to rounding). A few samples of scipy's own impulse response
(scipy.signal.sosfilt of a unit impulse) are stored too, so the test proves its difference equation agrees with scipy.
    1. 'lr4-lowpass-80-delayed': Linkwitz-Riley 4th-order low-pass at 80 Hz (S. H. Linkwitz, J. Audio Eng. Soc. 24(1),
       1976: the 2nd-order Butterworth squared), sos = butter(2, 80, 'lowpass', fs=48000, output='sos') stacked twice
       (pre-warped at the corner), delayed by 5 ms = 240 samples (zeros before the impulse).
    2. 'sealed-highpass-50-q0707': a sealed box's 2nd-order high-pass (R. H. Small, "Closed-Box Loudspeaker Systems",
       J. Audio Eng. Soc. 20, 1972): H(s) = s^2 / (s^2 + (w0/Q) s + w0^2), f0 = 50 Hz, Q = 0.707, w0 pre-warped to
       2 fs tan(pi f0 / fs) and taken through scipy.signal.bilinear(b, a, fs).
Exact responses: scipy.signal.sosfreqz on a log grid 20 Hz-2 kHz, 48 points per octave, times exp(-j w delay) for the
delayed case; stored as 'magnitudeDb' (20 log10 |H|) and 'phaseDeg' wrapped to (-180, 180] (numpy.angle), rounded to
1e-6 (dB, deg).
Arrival: the sample of largest |h| in scipy's impulse response (numpy.argmax), 'peakSample'.
Analog prototypes (what the sampled filters stand for; the upload test, tests/api/measurements-wav.test.ts, checks an
uploaded WAV against them): scipy.signal.freqs on the same grid, stored as 'analogMagnitudeDb' and 'analogPhaseDeg'
(wrapped, including the delay): the LR4 low-pass as butter(2, 2 pi 80, analog=True) squared (numerator and denominator
convolved, numpy.polymul) times exp(-j w 0.005 s); the sealed box as s^2 / (s^2 + (w0/Q) s + w0^2), w0 = 2 pi 50 rad/s
(not pre-warped). Above about 1.4 kHz the bilinear transform's frequency warping moves the LR4's digital stop band up to
0.19 dB from the analog one (at -110 dB); the sealed box differs by less than 1e-4 dB.

Run: python3 scripts/reference/impulse-fixtures.py > tests/dsp/fixtures/impulse-scipy.json
"""
import json
import math
import sys

import numpy as np
import scipy
from scipy import signal

FS_HZ = 48000
LENGTH_SAMPLES = FS_HZ  # 1 s
GRID = {'startHz': 20.0, 'stopHz': 2000.0, 'pointsPerOctave': 48}
CHECK_INDICES = [0, 1, 2, 5, 17, 100, 239, 240, 241, 250, 300, 400, 1000, 4800, 24000]


def log_grid_hz(start_hz, stop_hz, points_per_octave):
    count = int(math.floor(math.log2(stop_hz / start_hz) * points_per_octave + 1e-9)) + 1
    return start_hz * 2.0 ** (np.arange(count) / points_per_octave)


def lr4_lowpass_sos(corner_hz):
    half = signal.butter(2, corner_hz, 'lowpass', fs=FS_HZ, output='sos')
    return np.vstack([half, half])


def sealed_highpass_sos(corner_hz, q):
    w0 = 2 * FS_HZ * math.tan(math.pi * corner_hz / FS_HZ)  # pre-warped so the digital corner lands on corner_hz
    b, a = signal.bilinear([1.0, 0.0, 0.0], [1.0, w0 / q, w0 * w0], fs=FS_HZ)
    return signal.tf2sos(b, a)


def wrapped_deg(h):
    deg = np.angle(h, deg=True)
    return np.where(deg <= -180.0, deg + 360.0, deg)


def lr4_lowpass_analog(corner_hz):
    b, a = signal.butter(2, 2 * math.pi * corner_hz, 'lowpass', analog=True)
    return np.polymul(b, b), np.polymul(a, a)


def sealed_highpass_analog(corner_hz, q):
    w0 = 2 * math.pi * corner_hz
    return [1.0, 0.0, 0.0], [1.0, w0 / q, w0 * w0]


def case(name, description, sos, delay_samples, grid, analog):
    impulse = np.zeros(LENGTH_SAMPLES)
    impulse[delay_samples] = 1.0
    h_time = signal.sosfilt(sos, impulse)
    _, h = signal.sosfreqz(sos, worN=grid, fs=FS_HZ)
    h = h * np.exp(-1j * 2 * np.pi * grid / FS_HZ * delay_samples)
    w = 2 * np.pi * grid
    _, h_analog = signal.freqs(analog[0], analog[1], worN=w)
    h_analog = h_analog * np.exp(-1j * w * delay_samples / FS_HZ)
    return {
        'name': name, 'description': description, 'delaySamples': delay_samples,
        'sos': [[float(x) for x in row] for row in sos],
        'peakSample': int(np.argmax(np.abs(h_time))),
        'sampleChecks': [[i, float(h_time[i])] for i in CHECK_INDICES],
        'magnitudeDb': [float(x) for x in np.round(20 * np.log10(np.abs(h)), 6)],
        'phaseDeg': [float(x) for x in np.round(wrapped_deg(h), 6)],
        'analogMagnitudeDb': [float(x) for x in np.round(20 * np.log10(np.abs(h_analog)), 6)],
        'analogPhaseDeg': [float(x) for x in np.round(wrapped_deg(h_analog), 6)],
    }


def main():
    grid = log_grid_hz(GRID['startHz'], GRID['stopHz'], GRID['pointsPerOctave'])
    out = {
        'source': 'scipy.signal ' + scipy.__version__ + ' (butter, bilinear, tf2sos, sosfilt, sosfreqz); numpy '
                  + np.__version__,
        'generator': 'scripts/reference/impulse-fixtures.py',
        'sos': 'rows [b0, b1, b2, 1, a1, a2] (scipy convention, a0 = 1); the impulse is regenerated by the test',
        'phase': 'true phase including the delay, wrapped to (-180, 180] degrees',
        'analog': 'analogMagnitudeDb/analogPhaseDeg: scipy.signal.freqs of the analog prototype (LR4: butter(2, 2 pi 80, '
                  'analog=True) squared; sealed box: s^2/(s^2 + (w0/Q) s + w0^2), w0 = 2 pi 50), times exp(-j w delay)',
        'sampleRateHz': FS_HZ, 'lengthSamples': LENGTH_SAMPLES, 'grid': GRID,
        'frequencyHz': [float(x) for x in grid],
        'cases': [
            case('lr4-lowpass-80-delayed', 'LR4 low-pass at 80 Hz, delayed by 5 ms (240 samples)',
                 lr4_lowpass_sos(80.0), 240, grid, lr4_lowpass_analog(80.0)),
            case('sealed-highpass-50-q0707', 'sealed-box 2nd-order high-pass, 50 Hz, Q 0.707, no delay',
                 sealed_highpass_sos(50.0, 0.707), 0, grid, sealed_highpass_analog(50.0, 0.707)),
        ],
    }
    json.dump(out, sys.stdout, separators=(',', ':'))


if __name__ == '__main__':
    main()
