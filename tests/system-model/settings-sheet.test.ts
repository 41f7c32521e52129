import { describe, expect, it } from 'vitest';
import { computeSettingsSheet, SETTING_DECIMALS, settingsSheetCsv, slopeLabel } from '@/lib/system-model/settings-sheet';
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
    expect(lines[0]).toBe('system,revision,kind,id,label,profile,distanceM,distanceSource,delayMs,trimDb,gainDb,polarity,crossoverHz,filter,slope,count');
    expect(lines[1]).toBe('Test room,4,channel,l,L,Test main (invented),3.00,geometry,5.83,0.0,,normal,80,highpass,Butterworth 2nd order (12 dB/oct),1');
    expect(lines[4]).toBe('Test room,4,sub,sub-a,Sub A,Test sub (invented),4.00,geometry,2.91,,0.0,normal,80,lowpass,Linkwitz–Riley 4th order (24 dB/oct),2');
    expect(lines).toHaveLength(7); // header, 3 channels, 2 subs, and the empty string after the last CRLF
    expect(SETTING_DECIMALS).toEqual({ delayMs: 2, trimDb: 1, distanceM: 2 });
  });

  it('quotes a comma or quote (RFC 4180) and defuses a leading = + - @ so a spreadsheet never runs it', () => {
    expect(settingsSheetCsv('Den, "upstairs"', 1, testSystem()).split('\r\n')[1]!.startsWith('"Den, ""upstairs""",1,')).toBe(true);
    expect(settingsSheetCsv('=SUM(A1)', 1, testSystem()).split('\r\n')[1]!.startsWith("'=SUM(A1),1,")).toBe(true);
  });
});
