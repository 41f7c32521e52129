#!/usr/bin/env python3
"""Reference fixtures for paths with several natural roll-offs (a sub's low roll-off AND its upper roll-off; a
main speaker's low roll-off given as a one-element list), evaluated with scipy.signal (reference library).

Each roll-off is an analog B(s)/A(s) (sealed: s^2/(s^2 + s*w0/Q + w0^2); vented: Butterworth 4th-order high-pass;
lowpass: w0^2/(s^2 + s*w0/Q + w0^2)); a path multiplies its crossover filter by every roll-off in its list
(numpy.polymul), then gain, polarity and e^(-j w tau). The sum and its group delay are formed exactly as in
two-way-fixtures.py, whose helpers this script reuses.

Run: python3 scripts/reference/multi-rolloff-fixtures.py > tests/dsp/fixtures/multi-rolloff-systems.json
"""
import importlib.util
import json
import os
import sys

import numpy as np
import scipy

_spec = importlib.util.spec_from_file_location('two_way', os.path.join(os.path.dirname(__file__), 'two-way-fixtures.py'))
two_way = importlib.util.module_from_spec(_spec)
_spec.loader.exec_module(two_way)

SEED = 20241202
COUNT = 24


def low_rolloff(rng, low_hz, high_hz):
    if rng.random() < 0.5:
        return {'kind': 'sealed', 'cornerHz': float(np.round(rng.uniform(low_hz, high_hz), 3)), 'q': float(np.round(rng.uniform(0.5, 1.2), 4))}
    return {'kind': 'vented', 'cornerHz': float(np.round(rng.uniform(low_hz, high_hz), 3))}


def main():
    rng = np.random.default_rng(SEED)
    freq, w = two_way.fixture_grid()
    systems = []
    for k in range(COUNT):
        temperature_c, speed = two_way.random_air(rng)
        mains = {'name': 'mains', 'filter': two_way.random_filter(rng, 'highpass'), 'rolloff': [low_rolloff(rng, 35, 90)],
                 'gainDb': float(np.round(rng.uniform(-6, 6), 3)), 'delayMs': float(np.round(rng.uniform(0, 10), 4)),
                 'invert': False, 'distanceM': float(np.round(rng.uniform(0.5, 6), 3))}
        sub_rolloffs = [low_rolloff(rng, 15, 35),
                        {'kind': 'lowpass', 'cornerHz': float(np.round(rng.uniform(120, 400), 3)), 'q': float(np.round(rng.uniform(0.5, 1.2), 4))}]
        if k % 4 == 3:
            sub_rolloffs.append({'kind': 'none'})
        sub = {'name': 'sub', 'filter': two_way.random_filter(rng, 'lowpass'), 'rolloff': sub_rolloffs,
               'gainDb': float(np.round(rng.uniform(-6, 6), 3)), 'delayMs': float(np.round(rng.uniform(0, 10), 4)),
               'invert': bool(rng.random() < 0.5), 'distanceM': float(np.round(rng.uniform(0.5, 6), 3))}
        paths = [mains, sub]
        total, sub_only = two_way.sum_curves(paths, w, speed)
        systems.append({
            'temperatureC': temperature_c,
            'paths': paths,
            'subMagnitudeDb': [float(x) for x in 20 * np.log10(np.abs(sub_only))],
            'sum': total,
        })
    json.dump({'source': 'scipy.signal.freqs ' + scipy.__version__ + ', numpy ' + np.__version__,
               'generator': 'scripts/reference/multi-rolloff-fixtures.py', 'seed': SEED,
               'frequencyHz': [float(x) for x in freq], 'systems': systems}, sys.stdout, separators=(',', ':'))


if __name__ == '__main__':
    main()
