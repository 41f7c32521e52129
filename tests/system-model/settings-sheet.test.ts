import { describe, expect, it } from 'vitest';
import { computeSettingsSheet, SETTING_DECIMALS, settingsSheetCsv, slopeLabel, SPREAD_DECIMALS } from '@/lib/system-model/settings-sheet';
import { testSystem, withSpeaker, withSub } from './test-system';

const C20 = 331.3 * Math.sqrt(1 + 20 / 273.15);

describe('slopeLabel', () => {
  it('"Linkwitz–Riley 4th order (24 dB/oct)", "Butterworth 1st/2nd/3rd order", 6 dB/oct per order', () => {
    expect(slopeLabel({ family: 'linkwitz-riley', order: 4 })).toBe('Linkwitz–Riley 4th order (24 dB/oct)');
    expect(slopeLabel({ family: 'butterworth', order: 1 })).toBe('Butterworth 1st order (6 dB/oct)');
    expect(slopeLabel({ family: 'butterworth', order: 2 })).toBe('Butterworth 2nd order (12 dB/oct)');
    expect(slopeLabel({ family: 'butterworth', order: 3 })).toBe('Butterworth 3rd order (18 dB/oct)');
  });
});

describe('computeSettingsSheet: the figures a processor needs', () => {
  it('each channel: distance, delay and trim of the channel settings, its own offset, the high-pass', () => {
    const sheet = computeSettingsSheet(withSpeaker(testSystem(), 'C', { trimDb: 1.5 }));
    expect(sheet.channels[1]).toEqual({ id: 'c', channel: 'C', profileName: 'Test main (invented)', distanceM: 3, distanceSource: 'geometry', delayMs: 5.83, trimDb: 1.5, offsetDb: 1.5, highpassHz: 80, slope: 'Butterworth 2nd order (12 dB/oct)' });
  });

  it('each sub: distance, delay (its own delay inside), polarity, gain, count, the low-pass', () => {
    const sheet = computeSettingsSheet(withSub(testSystem(), 1, { delayMs: 1, invert: true, distanceOverrideM: 5.2 }));
    // Sub B set to 5.2 m is now the farthest; its own 1 ms on top; the mains are 2.2 m nearer, Sub A 1.2 m.
    expect(sheet.subs[1]).toEqual({ id: 'sub-b', name: 'Sub B', profileName: 'Test sub (invented)', count: 1, distanceM: 5.2, distanceSource: 'measured', delayMs: 0, ownDelayMs: 1, polarity: 'inverted', gainDb: 0, lowpassHz: 80, slope: 'Linkwitz–Riley 4th order (24 dB/oct)' });
    expect(sheet.subs[0]!.count).toBe(2);
  });

  it('the room: 126 m³, Schroeder 2000·√(RT60/V), the first axial mode along each dimension c/2L, c/2W, c/2H', () => {
    const sheet = computeSettingsSheet(testSystem());
    expect(sheet).toMatchObject({ layout: '3.1', mlpName: 'Centre chair', temperatureC: 20, crossoverHz: 80, mainsDelayMs: 0, lfeLowpassHz: 120, lfeGainDb: 10, notes: 'Invented test System.' });
    expect(sheet.room).toEqual({ lengthM: 7, widthM: 6, heightM: 3, volumeM3: 126, rt60S: 0.4 });
    expect(sheet.schroederHz).toBeCloseTo(2000 * Math.sqrt(0.4 / 126), 9);
    expect(sheet.firstAxialHz.length).toBeCloseTo(C20 / 14, 9);
    expect(sheet.firstAxialHz.width).toBeCloseTo(C20 / 12, 9);
    expect(sheet.firstAxialHz.height).toBeCloseTo(C20 / 6, 9);
    expect(sheet.firstModes).toHaveLength(12);
  });
});

describe('settingsSheetCsv: one row per channel and sub', () => {
  it('units in the column names, settings with the decimals they were rounded to, CRLF line ends', () => {
    const csv = settingsSheetCsv('Test room', 4, testSystem());
    const lines = csv.split('\r\n');
    expect(lines[0]).toBe('system,revision,kind,id,label,profile,distanceM,distanceSource,delayMs,trimDb,gainDb,polarity,crossoverHz,filter,slope,count,ownDelayMs,bandHz,meanSpreadDb,maxSpreadDb,maxSpreadHz,meanLevelDb');
    expect(lines[1]).toBe('Test room,4,channel,l,L,Test main (invented),3.00,geometry,5.83,0.0,,normal,80,highpass,Butterworth 2nd order (12 dB/oct),1,,,,,,');
    expect(lines[4]).toBe('Test room,4,sub,sub-a,Sub A,Test sub (invented),4.00,geometry,2.91,,0.0,normal,80,lowpass,Linkwitz–Riley 4th order (24 dB/oct),2,0.00,,,,,');
    expect(lines[6]).toMatch(/^Test room,4,seat-spread,neutral,"every sub own delay 0 ms, 0 dB, normal",(,){12}20-120,\d+\.\d{2},\d+\.\d{2},\d+\.\d,-?\d+\.\d{2}$/);
    expect(lines).toHaveLength(9); // header, 3 channels, 2 subs, 2 spreads, and the empty string after the last CRLF
    expect(SETTING_DECIMALS).toEqual({ delayMs: 2, trimDb: 1, distanceM: 2 });
  });

  it('quotes a comma or quote (RFC 4180) and defuses a leading = + - @ so a spreadsheet never runs it', () => {
    expect(settingsSheetCsv('Den, "upstairs"', 1, testSystem()).split('\r\n')[1]!.startsWith('"Den, ""upstairs""",1,')).toBe(true);
    expect(settingsSheetCsv('=SUM(A1)', 1, testSystem()).split('\r\n')[1]!.startsWith("'=SUM(A1),1,")).toBe(true);
  });
});

describe('Settings sheet: Seat balance', () => {
  const oneSub = () => ({ ...testSystem(), subs: testSystem().subs.slice(1) });

  it('one sub: its gain moves every seat alike (spread unchanged, mean level up by the gain) and its delay changes neither (common practice: one source, one transfer per seat)', () => {
    const plain = computeSettingsSheet(oneSub()).seatBalance!;
    const gained = computeSettingsSheet(withSub(oneSub(), 0, { gainDb: 4 })).seatBalance!;
    const delayed = computeSettingsSheet(withSub(oneSub(), 0, { delayMs: 7.5, invert: true })).seatBalance!;
    expect(plain.neutral).toEqual(plain.system);
    expect(gained.system.meanSpreadDb).toBeCloseTo(plain.system.meanSpreadDb, 2);
    expect(gained.system.meanLevelDb).toBeCloseTo(plain.system.meanLevelDb + 4, 2);
    expect(gained.neutral).toEqual(plain.neutral);
    expect(delayed.system.meanSpreadDb).toBeCloseTo(plain.system.meanSpreadDb, 2);
    expect(delayed.system.meanLevelDb).toBeCloseTo(plain.system.meanLevelDb, 2);
  });

  it('two subs: inverting one changes the spread with the System\'s settings, not the neutral one; fewer than two seats → no section', () => {
    const plain = computeSettingsSheet(testSystem()).seatBalance!;
    const flipped = computeSettingsSheet(withSub(testSystem(), 1, { invert: true })).seatBalance!;
    expect(flipped.neutral).toEqual(plain.neutral);
    expect(Math.abs(flipped.system.meanSpreadDb - plain.system.meanSpreadDb)).toBeGreaterThan(0.1);
    expect(plain.band).toEqual({ startHz: 20, stopHz: 120 });
    expect(computeSettingsSheet({ ...testSystem(), seats: testSystem().seats.slice(0, 1) }).seatBalance).toBeNull();
  });

  it('the CSV carries the sheet\'s numbers, number for number: each sub\'s own delay and both spreads', () => {
    const doc = withSub(testSystem(), 1, { delayMs: 3.25, gainDb: -1.5, invert: true });
    const sheet = computeSettingsSheet(doc);
    const rows = settingsSheetCsv('Test room', 2, doc).trim().split('\r\n').map((l) => l.split(/,(?=(?:[^"]*"[^"]*")*[^"]*$)/));
    const header = rows[0]!;
    const col = (row: string[], name: string) => row[header.indexOf(name)];
    const subB = rows.find((r) => r[3] === 'sub-b')!;
    expect([col(subB, 'ownDelayMs'), col(subB, 'gainDb'), col(subB, 'polarity')]).toEqual(['3.25', '-1.5', 'inverted']);
    const sb = sheet.seatBalance!;
    for (const [id, m] of [['neutral', sb.neutral], ['system', sb.system]] as const) {
      const row = rows.find((r) => r[2] === 'seat-spread' && r[3] === id)!;
      expect(row).toHaveLength(header.length);
      expect(col(row, 'meanSpreadDb')).toBe(m.meanSpreadDb.toFixed(SPREAD_DECIMALS.meanSpreadDb));
      expect(col(row, 'maxSpreadDb')).toBe(m.maxSpreadDb.toFixed(SPREAD_DECIMALS.maxSpreadDb));
      expect(col(row, 'maxSpreadHz')).toBe(m.maxSpreadHz.toFixed(SPREAD_DECIMALS.maxSpreadHz));
      expect(col(row, 'meanLevelDb')).toBe(m.meanLevelDb.toFixed(SPREAD_DECIMALS.meanLevelDb));
    }
  });
});
