#!/usr/bin/env python3
"""Reference fixtures for Seat balance: invented rooms with several subs and seats, the rectangular-room modal sum in
numpy, the seat-to-seat objective, and scipy.optimize.differential_evolution (reference library) over every sub's
delay, gain and polarity.

Modal sum (H. Kuttruff, "Room Acoustics", ch. 3), re-derived here from the formula, not from Seamline's code:
    p(w) = j*w*rho*c^2/V * sum_n psi_n(source)*psi_n(seat) / (Lambda_n * (w_n^2 - w^2 + 2j*delta*w))
    psi_n = cos(nL*pi*y/L) * cos(nW*pi*x/W) * cos(nH*pi*z/H), Lambda_n = product over axes of (1 if n = 0 else 1/2),
    delta = 6.91 / T60, rho = 1.204 kg/m^3, c = 331.3*sqrt(1 + T/273.15) m/s (Kinsler et al. 2000),
    every mode up to 1.5 x the grid's top frequency, plus the (0,0,0) term (w_n = 0, coupling 1).
x runs across the width, y along the length, z up; origin at the front-left floor corner.

Objective (Welti & Devantier, JAES 54(5), 2006; common practice for the spread): at each band frequency the seats'
pressures p_k = sum_s H_sk * g_s * (+-1) * exp(-j*w*tau_s); the spread is 10*log10(max_k |p_k|^2 / min_k |p_k|^2);
the objective is its mean over the band points (grid points with 20 <= f <= 120 Hz). Output floor: the mean of
|p_k|^2 over seats and band points, in dB relative to every sub at 0 ms / 0 dB / normal polarity, must be at least
-3 dB. Search box: delay 0..20 ms, gain -12..+6 dB, polarity 0/1 (integrality), the floor a NonlinearConstraint;
the neutral settings in the first population; several seeds, each followed by a bounded Powell polish
(scipy.optimize.minimize) of delays and gains with the polarities fixed; the best over seeds is kept.

Run: python3 scripts/reference/seat-balance-fixtures.py > tests/dsp/fixtures/seat-balance-scipy.json
Bench: python3 scripts/reference/seat-balance-fixtures.py --bench < problem.json  (one room as in the fixture's
'rooms' entries; one seed and scipy's default population size and generation cap, BENCH_DE_OPTIONS, so it ends in
minutes; prints {"objectiveDb", "meanLevelDb", "evaluations", "modalMs", "searchMs", ...} as JSON)
"""
import itertools
import json
import math
import sys
import time

import numpy as np
import scipy
from scipy.optimize import NonlinearConstraint, differential_evolution, minimize

RHO_AIR = 1.204
GRID = {'startHz': 20.0, 'stopHz': 120.0, 'pointsPerOctave': 48}
BAND = {'startHz': 20.0, 'stopHz': 120.0}
LIMITS = {'maxDelayMs': 20.0, 'minGainDb': -12.0, 'maxGainDb': 6.0, 'maxOutputLossDb': 3.0}
FIXTURE_SEEDS = (1, 2, 3)
DE_OPTIONS = {'strategy': 'rand1bin', 'popsize': 25, 'maxiter': 2500, 'tol': 1e-7, 'atol': 1e-7,
              'mutation': (0.5, 1.0), 'recombination': 0.9}
BENCH_DE_OPTIONS = {**DE_OPTIONS, 'popsize': 15, 'maxiter': 1000}

# Invented rooms (invented names, sizes and positions), 2-4 subs, 3-8 seats, RT60 0.3-0.6 s; LIMITS unless a room
# names its own.
ROOMS = [
    {'name': 'Small den (invented)', 'room': {'lengthM': 5.2, 'widthM': 3.9, 'heightM': 2.5}, 'rt60S': 0.35, 'temperatureC': 21,
     'subs': [{'x': 0.3, 'y': 0.3, 'z': 0.3}, {'x': 3.6, 'y': 4.9, 'z': 0.3}],
     'seats': [{'x': 1.3, 'y': 3.2, 'z': 1.0}, {'x': 1.95, 'y': 3.2, 'z': 1.0}, {'x': 2.6, 'y': 3.2, 'z': 1.0}]},
    {'name': 'Long lounge (invented)', 'room': {'lengthM': 7.3, 'widthM': 5.6, 'heightM': 2.9}, 'rt60S': 0.5, 'temperatureC': 19,
     'subs': [{'x': 2.8, 'y': 0.3, 'z': 0.3}, {'x': 5.3, 'y': 3.65, 'z': 0.3}, {'x': 0.3, 'y': 7.0, 'z': 0.3}],
     'seats': [{'x': x, 'y': y, 'z': 1.1} for y in (3.6, 4.8) for x in (1.9, 2.8, 3.7)]},
    {'name': 'Tight studio (invented)', 'room': {'lengthM': 4.4, 'widthM': 3.6, 'heightM': 2.4}, 'rt60S': 0.3, 'temperatureC': 23,
     'subs': [{'x': 0.25, 'y': 0.25, 'z': 0.25}, {'x': 3.35, 'y': 0.25, 'z': 0.25}, {'x': 1.8, 'y': 4.15, 'z': 0.25},
              {'x': 0.25, 'y': 2.2, 'z': 0.25}],
     'seats': [{'x': 1.4, 'y': 2.4, 'z': 1.05}, {'x': 2.2, 'y': 2.4, 'z': 1.05}, {'x': 1.0, 'y': 3.2, 'z': 1.05},
               {'x': 1.8, 'y': 3.2, 'z': 1.05}, {'x': 2.6, 'y': 3.2, 'z': 1.05}]},
    # The benchmark's case (scripts/bench-dsp.ts): 4 subs at the wall midpoints, 8 seats in two rows of four.
    {'name': 'Four-by-eight theater (invented)', 'room': {'lengthM': 6.4, 'widthM': 4.9, 'heightM': 2.7}, 'rt60S': 0.4, 'temperatureC': 20,
     'subs': [{'x': 2.45, 'y': 0.25, 'z': 0.25}, {'x': 4.65, 'y': 3.2, 'z': 0.25}, {'x': 2.45, 'y': 6.15, 'z': 0.25},
              {'x': 0.25, 'y': 3.2, 'z': 0.25}],
     'seats': [{'x': x, 'y': y, 'z': 1.1} for y in (3.6, 4.6) for x in (1.3, 2.0, 2.9, 3.6)]},
    # Cut only (no boost) and a 1 dB floor: raising every gain together no longer restores the level, so the floor binds
    # at the optimum and is tested, not only the spread.
    {'name': 'Narrow office (invented)', 'room': {'lengthM': 4.8, 'widthM': 3.2, 'heightM': 2.6}, 'rt60S': 0.45, 'temperatureC': 22,
     'limits': {'maxGainDb': 0.0, 'maxOutputLossDb': 1.0},
     'subs': [{'x': 0.3, 'y': 0.3, 'z': 0.3}, {'x': 2.9, 'y': 0.3, 'z': 0.3}, {'x': 1.6, 'y': 4.5, 'z': 0.3}],
     'seats': [{'x': 0.9, 'y': 2.9, 'z': 1.0}, {'x': 1.6, 'y': 2.9, 'z': 1.0}, {'x': 2.3, 'y': 2.9, 'z': 1.0},
               {'x': 1.6, 'y': 3.7, 'z': 1.0}]},
]


def speed_of_sound_mps(temperature_c):
    return 331.3 * math.sqrt(1 + temperature_c / 273.15)


def log_grid_hz(start_hz, stop_hz, points_per_octave):
    count = int(math.floor(math.log2(stop_hz / start_hz) * points_per_octave + 1e-9)) + 1
    return start_hz * 2.0 ** (np.arange(count) / points_per_octave)


def room_modes(room, max_hz, c):
    """Every (nL, nW, nH) with f <= max_hz, (0,0,0) excluded: indices (M, 3) and frequencies (M,)."""
    dims = np.array([room['lengthM'], room['widthM'], room['heightM']])
    top = np.floor(2 * max_hz * dims / c + 1e-9).astype(int)
    idx = np.array(list(itertools.product(*(range(t + 1) for t in top))))[1:]
    f = c / 2 * np.sqrt(((idx / dims) ** 2).sum(axis=1))
    keep = f <= max_hz * (1 + 1e-12)
    return idx[keep], f[keep]


def mode_shapes(idx, room, points):
    """psi_n at each point: (P, M)."""
    pos = np.array([[p['y'], p['x'], p['z']] for p in points])
    dims = np.array([room['lengthM'], room['widthM'], room['heightM']])
    return np.prod(np.cos(np.pi * idx[None, :, :] * pos[:, None, :] / dims), axis=2)


def modal_transfers(room, subs, seats, freq_hz, rt60_s, temperature_c, max_mode_hz):
    """H[sub, seat, frequency], Pa per m^3/s, complex."""
    c = speed_of_sound_mps(temperature_c)
    idx, f_modes = room_modes(room, max_mode_hz, c)
    lam = np.prod(np.where(idx > 0, 0.5, 1.0), axis=1)
    coupling = mode_shapes(idx, room, subs)[:, None, :] * mode_shapes(idx, room, seats)[None, :, :] / lam
    coupling = np.concatenate([np.ones(coupling.shape[:2] + (1,)), coupling], axis=2)  # (0,0,0) term first
    wn2 = np.concatenate([[0.0], (2 * np.pi * f_modes) ** 2])
    w = 2 * np.pi * np.asarray(freq_hz)
    delta = 6.91 / rt60_s
    resonance = 1.0 / (wn2[None, :] - w[:, None] ** 2 + 2j * delta * w[:, None])  # (F, M + 1)
    volume = room['lengthM'] * room['widthM'] * room['heightM']
    return 1j * w * RHO_AIR * c * c / volume * np.einsum('skm,fm->skf', coupling, resonance), len(f_modes)


def modal_transfer_by_loop(room, sub, seat, f_hz, rt60_s, temperature_c, max_mode_hz):
    """The same sum a second way: plain Python loops and complex numbers, one source, one seat, one frequency."""
    c = speed_of_sound_mps(temperature_c)
    L, W, H = room['lengthM'], room['widthM'], room['heightM']
    w = 2 * math.pi * f_hz
    delta = 6.91 / rt60_s
    total = 0j
    n_l = 0
    while c / 2 * n_l / L <= max_mode_hz:
        n_w = 0
        while c / 2 * math.hypot(n_l / L, n_w / W) <= max_mode_hz:
            n_h = 0
            while True:
                fn = c / 2 * math.sqrt((n_l / L) ** 2 + (n_w / W) ** 2 + (n_h / H) ** 2)
                if fn > max_mode_hz:
                    break
                psi = lambda p: (math.cos(n_l * math.pi * p['y'] / L) * math.cos(n_w * math.pi * p['x'] / W)
                                 * math.cos(n_h * math.pi * p['z'] / H))
                norm = (0.5 if n_l else 1.0) * (0.5 if n_w else 1.0) * (0.5 if n_h else 1.0)
                total += psi(sub) * psi(seat) / (norm * ((2 * math.pi * fn) ** 2 - w * w + 2j * delta * w))
                n_h += 1
            n_w += 1
        n_l += 1
    return 1j * w * RHO_AIR * c * c / (L * W * H) * total


class Problem:
    """The objective and the level of packed settings x = [delays ms (n), gains dB (n), polarity 0/1 (n)]."""

    def __init__(self, transfers, freq_hz):
        band = (freq_hz >= BAND['startHz']) & (freq_hz <= BAND['stopHz'])
        self.h = np.ascontiguousarray(np.transpose(transfers[:, :, band], (2, 1, 0)))  # (F, seat, sub)
        self.w_per_ms = 2 * np.pi * freq_hz[band] / 1000
        self.n = transfers.shape[0]
        self.evaluations = 0
        self._spread_of = {}
        self.reference = 1.0
        self.reference = self.power(np.zeros(3 * self.n)).mean()

    def power(self, x):
        """|p_k|^2 / reference per band point, seat and candidate: (F, K, S); x is (3n, S) or one candidate (3n,)."""
        n = self.n
        x = np.asarray(x, dtype=float)
        x = x[:, None] if x.ndim == 1 else x
        amplitude = 10.0 ** (x[n:2 * n] / 20) * np.where(x[2 * n:] >= 0.5, -1.0, 1.0)
        phase = self.w_per_ms[:, None, None] * x[:n][None, :, :]  # e^(-j*w*tau) per band point, sub, candidate
        p = self.h @ (amplitude * np.cos(phase) - 1j * amplitude * np.sin(phase))
        self.evaluations += x.shape[1]
        return (p.real ** 2 + p.imag ** 2) / self.reference

    def measure(self, x):
        """(objective dB, level dB) per candidate."""
        pw = self.power(x)
        spread = 10 * np.log10(pw.max(axis=1) / pw.min(axis=1)).mean(axis=0)
        return spread, 10 * np.log10(pw.mean(axis=(0, 1)))

    def measure_one(self, x):
        s, lv = self.measure(x)
        return float(s[0]), float(lv[0])

    def level_for_constraint(self, x):
        """The floor's constraint value; keeps the objective of each candidate, which DE asks for next."""
        spread, level = self.measure(x)
        cols = np.asarray(x).reshape(3 * self.n, -1)
        self._spread_of = {cols[:, j].tobytes(): spread[j] for j in range(cols.shape[1])}
        return level.reshape((1, -1) if np.ndim(x) == 2 else (1,))

    def objective_for_search(self, x):
        known = [self._spread_of.get(x[:, j].tobytes()) for j in range(x.shape[1])]
        if all(k is not None for k in known):
            return np.array(known)
        return self.measure(x)[0]


def optimise(problem, seeds, de_options, limits):
    """differential_evolution per seed, then a bounded Powell polish; the best over seeds."""
    n = problem.n
    bounds = [(0, limits['maxDelayMs'])] * n + [(limits['minGainDb'], limits['maxGainDb'])] * n + [(0, 1)] * n
    integrality = [False] * (2 * n) + [True] * n
    floor_db = -limits['maxOutputLossDb'] + 1e-6
    floor = NonlinearConstraint(problem.level_for_constraint, floor_db, np.inf)
    best = None
    per_seed = []
    problem.evaluations = 0
    t0 = time.perf_counter()
    for seed in seeds:
        r = differential_evolution(problem.objective_for_search, bounds, constraints=floor, integrality=integrality,
                                   vectorized=True, updating='deferred', polish=False, rng=np.random.default_rng(seed), x0=np.zeros(3 * n),
                                   **de_options)
        polarity = np.round(r.x[2 * n:])

        def continuous(y):
            s, lv = problem.measure_one(np.concatenate([y, polarity]))
            return s if lv >= floor_db else 1e3 + floor_db - lv

        p = minimize(continuous, r.x[:2 * n], method='Powell', bounds=bounds[:2 * n], options={'xtol': 1e-6, 'ftol': 1e-10, 'maxfev': 20000})
        x = np.concatenate([p.x, polarity]) if p.fun <= r.fun else np.concatenate([r.x[:2 * n], polarity])
        objective, level = problem.measure_one(x)
        per_seed.append(objective)
        if best is None or objective < best[1]:
            best = (x, objective, level, seed, float(r.fun), int(r.nit), per_seed)
    return best, problem.evaluations, time.perf_counter() - t0


def settings_of(x, n):
    return [{'delayMs': float(x[s]), 'gainDb': float(x[n + s]), 'invert': bool(x[2 * n + s] >= 0.5)} for s in range(n)]


def self_check():
    """The numpy modal sum against the loop, and the mode list against REFERENCES.md (Rayleigh 1896)."""
    room = {'lengthM': 6.4, 'widthM': 4.9, 'heightM': 2.7}
    c = speed_of_sound_mps(20)
    idx, f = room_modes(room, 200, c)
    assert len(f) == 106, len(f)
    assert abs(np.sort(f)[0] - 26.81) < 0.005 and abs(np.sort(f)[2] - 44.11) < 0.005
    sub, seat = {'x': 0.3, 'y': 0.3, 'z': 0.3}, {'x': 2.45, 'y': 3.8, 'z': 1.1}
    for f_hz in (23.7, 61.0, 118.4):
        h, _ = modal_transfers(room, [sub], [seat], np.array([f_hz]), 0.4, 20, 180)
        ref = modal_transfer_by_loop(room, sub, seat, f_hz, 0.4, 20, 180)
        assert abs(h[0, 0, 0] - ref) <= 1e-9 * abs(ref), (f_hz, h[0, 0, 0], ref)


def room_limits(spec):
    return {**LIMITS, **spec.get('limits', {})}


def solve_room(spec, seeds, de_options):
    freq = log_grid_hz(GRID['startHz'], GRID['stopHz'], GRID['pointsPerOctave'])
    max_mode_hz = 1.5 * float(freq[-1])
    t0 = time.perf_counter()
    h, mode_count = modal_transfers(spec['room'], spec['subs'], spec['seats'], freq, spec['rt60S'], spec['temperatureC'], max_mode_hz)
    modal_s = time.perf_counter() - t0
    problem = Problem(h, freq)
    (x, objective, level, seed, de_objective, generations, per_seed), evaluations, search_s = optimise(problem, seeds, de_options, room_limits(spec))
    neutral_objective, neutral_level = problem.measure_one(np.zeros(3 * problem.n))
    return freq, max_mode_hz, h, mode_count, {
        'bestSettings': settings_of(x, problem.n), 'bestObjectiveDb': objective, 'bestMeanLevelDb': level,
        'bestSeed': seed, 'deObjectiveDb': de_objective, 'deGenerations': generations, 'seedObjectivesDb': per_seed, 'neutralObjectiveDb': neutral_objective,
        'neutralMeanLevelDb': neutral_level, 'evaluations': evaluations, 'wallTimeS': search_s, 'modalTimeS': modal_s,
    }


def bench():
    spec = json.load(sys.stdin)
    _, _, _, _, r = solve_room(spec, (1,), BENCH_DE_OPTIONS)
    print(json.dumps({'objectiveDb': r['bestObjectiveDb'], 'meanLevelDb': r['bestMeanLevelDb'], 'evaluations': r['evaluations'],
                      'modalMs': r['modalTimeS'] * 1000, 'searchMs': r['wallTimeS'] * 1000, 'scipy': scipy.__version__,
                      'popsize': BENCH_DE_OPTIONS['popsize'], 'maxiter': BENCH_DE_OPTIONS['maxiter'], 'generations': r['deGenerations']}))


def main():
    self_check()
    rooms = []
    freq = max_mode_hz = None
    for spec in ROOMS:
        freq, max_mode_hz, h, mode_count, r = solve_room(spec, FIXTURE_SEEDS, DE_OPTIONS)
        print(f"{spec['name']}: neutral {r['neutralObjectiveDb']:.3f} dB -> scipy {r['bestObjectiveDb']:.3f} dB "
              f"(level {r['bestMeanLevelDb']:.2f} dB, {r['evaluations']} evaluations, {r['wallTimeS']:.1f} s)", file=sys.stderr)
        check = h[0, 0]
        rooms.append({**spec, 'limits': room_limits(spec), 'modeCount': mode_count, **r,
                      'firstTransferDb': [float(v) for v in 20 * np.log10(np.abs(check))]})
    json.dump({
        'source': f'scipy.optimize.differential_evolution {scipy.__version__}, numpy {np.__version__}',
        'generator': 'scripts/reference/seat-balance-fixtures.py',
        'numpy': np.__version__, 'scipy': scipy.__version__,
        'grid': GRID, 'band': BAND, 'limits': LIMITS, 'maxModeHz': max_mode_hz,
        'search': {**DE_OPTIONS, 'mutation': list(DE_OPTIONS['mutation']), 'seeds': list(FIXTURE_SEEDS),
                   'polarity': 'integrality', 'floor': 'NonlinearConstraint', 'polish': 'minimize Powell, polarities fixed'},
        'frequencyHz': [float(f) for f in freq],
        'rooms': rooms,
    }, sys.stdout, indent=1)
    sys.stdout.write('\n')


if __name__ == '__main__':
    bench() if '--bench' in sys.argv[1:] else main()
