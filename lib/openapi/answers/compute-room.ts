import { z } from 'zod';
import type { HeadroomAnswer } from '@/lib/system-model/headroom';
import type { LayoutAnswer } from '@/lib/system-model/layout';
import type { RoomModesAnswer } from '@/lib/system-model/room-modes';
import type { RoomResponseAnswer } from '@/lib/system-model/room-response';

/**
 * The answers of POST /api/v1/room-modes, /room-response, /layout and /headroom, each tied to the TypeScript type its
 * handler returns (a compile-time check below), strict so an undocumented field in a live answer fails the answer test.
 */

type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;

const hz = (description: string) => z.number().meta({ description, 'x-unit': 'Hz' });
const db = (description: string) => z.number().meta({ description, 'x-unit': 'dB' });
const m = (description: string) => z.number().meta({ description, 'x-unit': 'm' });
const ms = (description: string) => z.number().meta({ description, 'x-unit': 'ms' });
const deg = (description: string) => z.number().meta({ description, 'x-unit': '°' });
const count = (description: string) => z.number().int().meta({ description });

const modeKind = z.enum(['axial', 'tangential', 'oblique']).meta({ description: 'axial (one index non-zero), tangential (two) or oblique (three).' });
const indices = z.tuple([z.number().int(), z.number().int(), z.number().int()]).meta({ description: 'Half-waves along the length, width and height: [nL, nW, nH].' });
const speedOfSound = z.number().meta({ description: 'Speed of sound at temperatureC.', 'x-unit': 'm/s' });
const schroeder = hz('Schroeder frequency 2000·√(T60/V) (Schroeder, JASA 99(5), 1996): above it the modal prediction loses meaning.');

// ------------------------------------------------------------------------------------------------ room-modes

export const roomModesAnswerSchema = z.strictObject({
  speedOfSoundMps: speedOfSound,
  volumeM3: z.number().meta({ description: 'Room volume.', 'x-unit': 'm³' }),
  modes: z
    .array(z.strictObject({ frequencyHz: hz('The mode’s frequency (Rayleigh).'), indices, kind: modeKind }))
    .meta({ description: 'Every mode up to maxHz, sorted by frequency, (0,0,0) excluded.' }),
  kindCounts: z.strictObject({ axial: count('Axial modes.'), tangential: count('Tangential modes.'), oblique: count('Oblique modes.') }).meta({ description: 'How many modes of each kind.' }),
  schroederHz: schroeder,
  statisticalCount: z
    .strictObject({
      frequencyHz: hz('maxHz.'),
      expected: z.number().meta({ description: 'Kuttruff’s expected number of modes below it.' }),
      enumerated: count('The number of modes enumerated.'),
      source: z.string().meta({ description: 'Where the formula comes from.' }),
    })
    .meta({ description: 'Kuttruff’s expected number of modes below maxHz beside the number enumerated: an independent check.' }),
  thirdOctaveBands: z
    .array(
      z.strictObject({
        centerHz: hz('Exact mid-band frequency (base ten).'),
        nominalHz: hz('The band’s label, the IEC 61260-1 nominal mid-band frequency (25, 31.5, 40 … 160, 200).'),
        lowerHz: hz('Lower band edge.'),
        upperHz: hz('Upper band edge.'),
        count: count('Modes in the band.'),
        axial: count('Axial modes in the band.'),
        tangential: count('Tangential modes in the band.'),
        oblique: count('Oblique modes in the band.'),
      }),
    )
    .meta({ description: 'Modes per IEC 61260-1 base-ten one-third-octave band from 20 Hz; only bands wholly below maxHz.' }),
  bonello: z
    .strictObject({
      passes: z.boolean().meta({ description: 'Both rules hold.' }),
      startHz: hz('Centre of the first band judged.'),
      stopHz: hz('Centre of the last band judged.'),
      decreasingAtHz: z.array(z.number()).meta({ description: 'Band centres where the count falls from the band below.', 'x-unit': 'Hz' }),
      coincidencesAtHz: z.array(z.number()).meta({ description: 'Band centres (bands under five modes) holding coincident modes.', 'x-unit': 'Hz' }),
      coincidenceToleranceHz: hz('Modes this close count as coincident.'),
      source: z.string().meta({ description: 'Where the criterion comes from.' }),
    })
    .nullable()
    .meta({ description: 'Bonello criterion over the bands up to 200 Hz: counts never fall from band to band; no coincident modes (within 0.5 Hz) in bands under five modes. null when no complete band exists.' }),
  nearCoincident: z
    .strictObject({
      tolerancePercent: z.number().meta({ description: 'Pairs closer than this share of the lower frequency.' }),
      belowHz: hz('Pairs are looked for below this (the Schroeder frequency or maxHz).'),
      pairs: z
        .array(z.strictObject({ lowerHz: hz('The lower mode.'), upperHz: hz('The upper mode.'), separationHz: hz('Their distance.'), lower: indices, upper: indices }))
        .meta({ description: 'The pairs, at most 200.' }),
      truncated: z.boolean().meta({ description: 'True when more than 200 pairs were found.' }),
    })
    .meta({ description: 'Pairs of modes within 2 % of each other below the Schroeder frequency.' }),
  proportions: z
    .strictObject({
      passes: z.boolean().meta({ description: 'Every criterion holds.' }),
      lengthToHeight: z.number().meta({ description: 'l/h.' }),
      widthToHeight: z.number().meta({ description: 'w/h.' }),
      criteria: z
        .array(z.strictObject({ name: z.string().meta({ description: 'The criterion.' }), passes: z.boolean().meta({ description: 'Whether it holds.' }) }))
        .meta({ description: 'Each criterion and whether it holds.' }),
      source: z.string().meta({ description: 'Where the criteria come from.' }),
    })
    .meta({ description: 'ITU-R BS.1116-3 (2015): 1.1·w/h ≤ l/h ≤ 4.5·w/h − 4, l/h < 3, w/h < 3.' }),
});

// ------------------------------------------------------------------------------------------------ room-response

const levels = (description: string) => z.array(z.number()).meta({ description, 'x-unit': 'dB' });

export const roomResponseAnswerSchema = z.strictObject({
  speedOfSoundMps: speedOfSound,
  frequencyHz: z.array(z.number()).meta({ description: 'The grid.', 'x-unit': 'Hz' }),
  modeCount: count('Modes in the sum.'),
  maxModeHz: hz('Modes up to this frequency (1.5 × stopHz) are summed.'),
  schroederHz: schroeder,
  referenceDb: db('The absolute level taken as 0 dB, re 1 Pa per m³/s of volume velocity: the power mean of the summed response over every seat within the spread band.'),
  subs: z.array(z.strictObject({ name: z.string().meta({ description: 'The sub’s name.' }) })).meta({ description: 'The subs, in request order (the order of perSubDb).' }),
  seats: z
    .array(
      z.strictObject({
        name: z.string().meta({ description: 'The seat’s name.' }),
        summedDb: levels('Level of the subs summed (with their gain, delay and polarity) at each frequency.'),
        perSubDb: z.array(z.array(z.number())).meta({ description: 'Level of each sub alone at each frequency: perSubDb[sub][frequency].', 'x-unit': 'dB' }),
        bandMeanDb: db('Power mean of summedDb over the spread band.'),
      }),
    )
    .meta({ description: 'Each seat’s predicted level, by modal summation damped by RT60; 0 dB is referenceDb.' }),
  spread: z
    .strictObject({
      startHz: hz('The band’s start.'),
      stopHz: hz('The band’s end.'),
      spreadDb: levels('Loudest minus quietest seat at each frequency.'),
      meanSpreadDb: db('Mean of spreadDb over the band.'),
      maxSpreadDb: db('Largest spreadDb in the band.'),
      maxSpreadHz: hz('Where it is.'),
    })
    .nullable()
    .meta({ description: 'The seat-to-seat spread; null for one seat.' }),
  map: z
    .strictObject({
      indices,
      kind: modeKind,
      frequencyHz: hz('The mode’s frequency.'),
      zM: m('Height of the map.'),
      columns: count('Cells across the width (the count used).'),
      rows: count('Cells along the length (the count used).'),
      xM: z.array(z.number()).meta({ description: 'Cell centres across the width.', 'x-unit': 'm' }),
      yM: z.array(z.number()).meta({ description: 'Cell centres along the length.', 'x-unit': 'm' }),
      pressure: z.array(z.array(z.number())).meta({ description: 'Relative pressure (−1..1) of the mode at the cell centres, pressure[row][column], row 0 at the front wall.' }),
      seatPressure: z.array(z.number()).meta({ description: 'The mode at each seat’s own position, in seat order.' }),
    })
    .nullable()
    .meta({ description: 'One mode over the floor; null when no map was asked for.' }),
  quarterWave: z
    .array(z.strictObject({ name: z.string().meta({ description: 'The source.' }), distanceM: m('Its distance to the wall behind it.'), notchHz: hz('The first cancellation, c / (4d).') }))
    .meta({ description: 'First front-wall cancellation of each source (Allison, JAES 22(5), 1974).' }),
});

// ------------------------------------------------------------------------------------------------ layout

const angleRange = (what: string) =>
  z.strictObject({ nominal: deg(`Nominal ${what}.`), min: deg(`Smallest ${what} recommended.`), max: deg(`Largest ${what} recommended.`) }).meta({ description: `The recommended ${what} range (for azimuth, magnitudes on the channel’s side).`, 'x-unit': '°' });
const side = z.string().meta({ description: 'left, right or centre.' });
const distanceSource = z.enum(['measured', 'geometry']).meta({ description: '"measured" when distanceOverrideM was given, else from the positions.' });

export const layoutAnswerSchema = z.strictObject({
  template: z
    .strictObject({
      id: z.string().meta({ description: 'The template.' }),
      subwooferCount: count('Sub channels the template names (the .1).'),
      channels: z
        .array(
          z.strictObject({
            label: z.string().meta({ description: 'L, C, R, SL…' }),
            name: z.string().meta({ description: 'The channel in words.' }),
            side,
            azimuthDeg: angleRange('azimuth'),
            elevationDeg: angleRange('elevation'),
            source: z.string().meta({ description: 'Where the range comes from.' }),
          }),
        )
        .meta({ description: 'The template’s channels.' }),
    })
    .meta({ description: 'The template and its channels’ recommended directions.' }),
  speakers: z
    .array(
      z.strictObject({
        channel: z.string().meta({ description: 'As given.' }),
        name: z.string().meta({ description: 'The channel in words.' }),
        azimuthDeg: deg('Azimuth from the MLP, positive to the listener’s left.'),
        elevationDeg: deg('Elevation from the MLP.'),
        distanceM: m('Distance the processor is given, 0.01 m (the override when there is one).'),
        distanceSource,
        geometricDistanceM: m('Distance from the positions, 0.001 m, also with an override.'),
        status: z.enum(['pass', 'warn', 'unlisted']).meta({ description: 'pass / warn against the channel’s range; unlisted when the channel is not in the template.' }),
        recommended: z
          .strictObject({ azimuthDeg: angleRange('azimuth'), elevationDeg: angleRange('elevation'), side, source: z.string().meta({ description: 'Where the range comes from.' }) })
          .nullable()
          .meta({ description: 'The channel’s recommended range; null when unlisted.' }),
        azimuthOffDeg: deg('How far the azimuth lies outside its range (0 inside).'),
        elevationOffDeg: deg('How far the elevation lies outside its range (0 inside).'),
        wrongSide: z.boolean().meta({ description: 'True when the speaker sits on the other side of the listener.' }),
        message: z.string().meta({ description: 'The verdict in words.' }),
        facingDeg: deg('Heading before toe-in.'),
        toeInDeg: deg('Toe-in to aim at the MLP, a seat or a point.'),
        rotationDeg: deg('Heading after toe-in.'),
        tiltDeg: deg('Tilt to aim at the ear height.'),
        delayMs: ms('Distance alignment to the farthest speaker or sub plus the mains delay, the delay every source shares taken out (the smallest is 0), 0.01 ms.'),
        trimDb: db('Level match by distance among the speakers, 20·log10(d/d_max), plus the channel’s offset, 0.1 dB; a measured level match supersedes it.'),
      }),
    )
    .meta({ description: 'Each speaker, in request order.' }),
  subs: z
    .array(
      z.strictObject({
        name: z.string().meta({ description: 'As given.' }),
        distanceM: m('Distance to the MLP, 0.01 m.'),
        distanceSource,
        delayMs: ms('Distance alignment plus the sub’s own delay, the shared delay taken out, 0.01 ms.'),
        gainDb: db('Its gain, 0.1 dB.'),
      }),
    )
    .meta({ description: 'Each sub, in request order.' }),
  frontPair: z
    .strictObject({ includedAngleDeg: deg('Angle between L and R seen from the MLP (an equilateral triangle gives 60°).'), recommended: angleRange('included angle'), status: z.enum(['pass', 'warn']).meta({ description: 'Against the range.' }) })
    .nullable()
    .meta({ description: 'The front pair; null without both L and R.' }),
  missingChannels: z.array(z.string()).meta({ description: 'Template channels the request lacks.' }),
  farthest: z.strictObject({ name: z.string().meta({ description: 'The speaker’s channel or the sub’s name.' }), distanceM: m('Its distance, 0.01 m.') }).meta({ description: 'The speaker or sub the others are aligned to.' }),
  nominalPositions: z
    .array(
      z.strictObject({
        channel: z.string().meta({ description: 'The template channel.' }),
        xM: m('x.'),
        yM: m('y.'),
        zM: m('z.'),
        distanceM: m('Distance from the MLP.'),
        clamped: z.boolean().meta({ description: 'True when moved inside the walls.' }),
      }),
    )
    .nullable()
    .meta({ description: 'With radiusM: where each template channel sits at its nominal angles; null without.' }),
  notes: z.array(z.string()).meta({ description: 'Notes to show with the figures.' }),
});

// ------------------------------------------------------------------------------------------------ headroom

const spl = (description: string) => db(`${description}, dB SPL.`);
const watts = (description: string) => z.number().meta({ description, 'x-unit': 'W' });

const headroomRow = z.strictObject({
  name: z.string().meta({ description: 'As given.' }),
  maxSplDb: spl('Maximum SPL at the MLP at the binding limit: the amplifier, or the speaker’s rating when the amplifier is above it'),
  amplifierSplDb: spl('Maximum SPL with the full amplifier'),
  ratedSplDb: z.number().nullable().meta({ description: 'Maximum SPL at the speaker’s rating, dB SPL; null without a rating.', 'x-unit': 'dB' }),
  binding: z.enum(['amplifier', 'speaker']).meta({ description: 'Which limit sets maxSplDb and the headroom.' }),
  usablePowerW: watts('The power maxSplDb is computed at: min(amplifier, rating).'),
  ratedPowerW: z.number().nullable().meta({ description: 'The rating as given; null without one.', 'x-unit': 'W' }),
  perUnitSplDb: spl('One unit’s maximum SPL'),
  sensitivity1WDb: spl('Sensitivity for 1 W at 1 m (2.83 V ratings converted)'),
  targetPeakDb: spl('The target peak'),
  headroomDb: db('maxSplDb − target (negative: short of it).'),
  deficitDb: db('How far short of the target (0 when it is met).'),
  meetsTarget: z.boolean().meta({ description: 'maxSplDb reaches the target.' }),
  powerW: watts('Amplifier power per unit, as given.'),
  powerNeededW: watts('Power the target needs.'),
  exceedsRatedPower: z.boolean().nullable().meta({ description: 'With a rating: the power needed exceeds it; null without one.' }),
  amplifierAboveRating: z.boolean().nullable().meta({ description: 'With a rating: the amplifier is above it; null without one.' }),
});

export const headroomAnswerSchema = z.strictObject({
  referenceLevelDb: spl('The reference level (average)'),
  channelTargetPeakDb: spl('The peak target per channel (105)'),
  subTargetPeakDb: spl('The peak target of the subs together (115)'),
  channels: z.array(headroomRow).meta({ description: 'One row per channel.' }),
  subs: z.array(headroomRow).meta({ description: 'One row per sub, each held to its share of the subs’ target.' }),
  subsCombined: z
    .strictObject({
      summation: z.enum(['coherent', 'power']).meta({ description: 'How the subs were added.' }),
      maxSplDb: spl('The subs together'),
      targetPeakDb: spl('Their target'),
      headroomDb: db('maxSplDb − target.'),
      meetsTarget: z.boolean().meta({ description: 'The target is met.' }),
      powerScale: z.number().meta({ description: 'Multiplies each sub’s power to reach the target.' }),
    })
    .nullable()
    .meta({ description: 'The subs together against 115 dB SPL; null without subs.' }),
  allMeetTarget: z.boolean().meta({ description: 'Every row (and the subs together) meets its target.' }),
  exposure: z
    .array(z.strictObject({ levelDba: z.number().meta({ description: 'Level, dBA.', 'x-unit': 'dB' }), minutes: z.number().meta({ description: 'Permissible minutes a day.' }) }))
    .meta({ description: 'NIOSH permissible daily exposure (85 dBA for 8 h, 3 dB exchange).' }),
  safety: z.array(z.string()).meta({ description: 'Hearing-safety and installation cautions to show with the figures.' }),
});

const _roomModes: Same<z.output<typeof roomModesAnswerSchema>, RoomModesAnswer> = true;
const _roomResponse: Same<z.output<typeof roomResponseAnswerSchema>, RoomResponseAnswer> = true;
const _layout: Same<z.output<typeof layoutAnswerSchema>, LayoutAnswer> = true;
const _headroom: Same<z.output<typeof headroomAnswerSchema>, HeadroomAnswer> = true;
void [_roomModes, _roomResponse, _layout, _headroom];
