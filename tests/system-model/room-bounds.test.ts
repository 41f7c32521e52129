/**
 * No silent change of the user's work: changing the room never moves a seat, speaker or sub; what no longer fits is
 * named by one function (positionsOutsideRoom), refused by the System schema, and kept by the editor's draft reading.
 */
import { describe, expect, it } from 'vitest';
import { decodeDocument, editorPath, encodeDocument, keepPendingSystem, MAX_RETURN_URL_CHARS, signInToSaveHref, takePendingSystem } from '@/lib/client/url-state';
import { newSystemDocument } from '@/lib/demo/systems';
import { outsideForMlpGeometry, positionsOutsideRoom, refineInsideRoom } from '@/lib/system-model/room-bounds';
import { applyRoomToDocument } from '@/lib/system-model/room-modes';
import { roomResponseRequestFromDocument } from '@/lib/system-model/room-response';
import { safeReturnPath } from '@/lib/return-path';
import { systemDocumentDraftSchema, systemDocumentSchema, type SystemDocument } from '@/lib/validations/system';

const withL = (doc: SystemDocument, patch: Partial<SystemDocument['speakers'][number]>): SystemDocument => ({ ...doc, speakers: doc.speakers.map((s) => (s.channel === 'L' ? { ...s, ...patch } : s)) });
const indexOf = (doc: SystemDocument, channel: string) => doc.speakers.findIndex((s) => s.channel === channel);

describe('positionsOutsideRoom', () => {
  it('is empty for the new System, every position inside its 6.4 × 4.9 × 2.7 m room', () => {
    expect(positionsOutsideRoom(newSystemDocument())).toEqual([]);
  });

  it('names the item, the coordinate and the wall: L at x = 40 m in a 4.9 m wide room', () => {
    const doc = withL(newSystemDocument(), { xM: 40 });
    expect(positionsOutsideRoom(doc)).toEqual([{ path: `speakers.${indexOf(doc, 'L')}.xM`, message: 'L is 40 m across in a 4.9 m wide room' }]);
  });

  it('a room 1.5 m long leaves the seats, the surrounds and nothing else outside, each by its y', () => {
    const doc = { ...newSystemDocument(), room: { ...newSystemDocument().room, lengthM: 1.5 } };
    const out = positionsOutsideRoom(doc);
    expect(out.map((o) => o.path)).toEqual(['seats.0.yM', 'seats.1.yM', 'seats.2.yM', `speakers.${indexOf(doc, 'SL')}.yM`, `speakers.${indexOf(doc, 'SR')}.yM`]);
    expect(out[1]?.message).toBe('Row 1 centre (MLP) is 3.7 m into a 1.5 m long room');
    expect(out[3]?.message).toBe('SL is 4.1 m into a 1.5 m long room');
  });

  it('a position on a wall is inside; height and every coordinate of one item are reported', () => {
    const doc = newSystemDocument();
    const onWalls = withL(doc, { xM: doc.room.widthM, yM: doc.room.lengthM, zM: doc.room.heightM });
    expect(positionsOutsideRoom(onWalls)).toEqual([]);
    const beyond = withL(doc, { xM: 5, yM: 7, zM: 3 });
    const i = indexOf(doc, 'L');
    expect(positionsOutsideRoom(beyond)).toEqual([
      { path: `speakers.${i}.xM`, message: 'L is 5 m across in a 4.9 m wide room' },
      { path: `speakers.${i}.yM`, message: 'L is 7 m into a 6.4 m long room' },
      { path: `speakers.${i}.zM`, message: 'L is 3 m up in a 2.7 m high room' },
    ]);
  });

  it('outsideForMlpGeometry keeps the MLP, the speakers and the subs, not the other seats', () => {
    const doc = newSystemDocument();
    const leftSeatOut = { ...doc, seats: doc.seats.map((s) => (s.id === 'left' ? { ...s, xM: 9 } : s)) };
    expect(positionsOutsideRoom(leftSeatOut)).toHaveLength(1);
    expect(outsideForMlpGeometry(leftSeatOut, positionsOutsideRoom(leftSeatOut))).toEqual([]);
    const mlpOut = { ...doc, seats: doc.seats.map((s) => (s.id === 'mlp' ? { ...s, xM: 9 } : s)) };
    expect(outsideForMlpGeometry(mlpOut, positionsOutsideRoom(mlpOut)).map((o) => o.path)).toEqual(['seats.1.xM']);
  });

  it('refineInsideRoom adds one zod issue per coordinate, with its path', () => {
    const issues: { code: string; path: (string | number)[]; message: string }[] = [];
    refineInsideRoom({ addIssue: (i) => issues.push(i) }, { widthM: 4, lengthM: 5, heightM: 2.5 }, [{ label: 'Chair', position: { xM: 4.5, yM: 1, zM: 3 }, path: ['seats', 2] }]);
    expect(issues).toEqual([
      { code: 'custom', path: ['seats', 2, 'xM'], message: 'Chair is 4.5 m across in a 4 m wide room' },
      { code: 'custom', path: ['seats', 2, 'zM'], message: 'Chair is 3 m up in a 2.5 m high room' },
    ]);
  });
});

describe('applyRoomToDocument: changing the room never moves anything', () => {
  it('6.4 → 1.5 → 6.4 m leaves every seat, speaker and sub where it was (the MLP stays at y = 3.7 m)', () => {
    const start = newSystemDocument();
    const shrunk = applyRoomToDocument(start, { lengthM: 1.5 });
    expect(shrunk.doc.room.lengthM).toBe(1.5);
    expect(shrunk.doc.seats).toEqual(start.seats);
    expect(shrunk.doc.speakers).toEqual(start.speakers);
    expect(shrunk.doc.subs).toEqual(start.subs);
    expect(shrunk.outside.map((o) => o.path)).toContain('seats.1.yM');
    const back = applyRoomToDocument(shrunk.doc, { lengthM: 6.4 });
    expect(back.doc).toEqual(start);
    expect(back.outside).toEqual([]);
  });
});

describe('the System schema and the editor’s draft reading', () => {
  it('a saved System may not hold a position outside its room: refused by path with the message', () => {
    const doc = withL(newSystemDocument(), { xM: 40 });
    const parsed = systemDocumentSchema.safeParse(doc);
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([[`speakers.${indexOf(doc, 'L')}.xM`, 'L is 40 m across in a 4.9 m wide room']]);
  });

  it('the draft schema keeps it (and still refuses anything else that is wrong)', () => {
    const doc = withL(newSystemDocument(), { xM: 40 });
    expect(systemDocumentDraftSchema.safeParse(doc).success).toBe(true);
    expect(systemDocumentDraftSchema.safeParse({ ...doc, mlpSeatId: 'nobody' }).success).toBe(false);
  });

  it('a link whose room was made smaller than its seats opens that same System, not a fresh one', () => {
    const doc = applyRoomToDocument(newSystemDocument(), { lengthM: 1.5 }).doc;
    const { doc: opened, problem } = decodeDocument(encodeDocument(doc));
    expect(problem).toBeNull();
    expect(opened).toEqual(doc);
  });

  it('the seat-response request is not built from seats or subs outside the room; an outside L gets no front-wall notch', () => {
    const shrunk = applyRoomToDocument(newSystemDocument(), { lengthM: 1.5 }).doc;
    expect(positionsOutsideRoom(shrunk).some((o) => o.path.startsWith('seats.'))).toBe(true);
    const lOut = withL(newSystemDocument(), { yM: 7 });
    const body = roomResponseRequestFromDocument(lOut);
    expect(body?.quarterWave.map((q) => q.name)).not.toContain('L');
    expect(body?.quarterWave.map((q) => q.name)).toContain('C');
  });
});

describe('Sign in to save: the anonymous System comes back whole', () => {
  const state = { doc: applyRoomToDocument({ ...newSystemDocument(), bassManagement: { ...newSystemDocument().bassManagement, crossoverHz: 110 } }, { lengthM: 7.2 }).doc, name: 'Attic cinema (invented)', panel: 'modes' };

  it('a short document travels in the callbackUrl, whole, name and panel included, and passes the same-origin check', () => {
    const { href, inLink } = signInToSaveHref(state);
    expect(inLink).toBe(true);
    const url = new URL(href, 'http://127.0.0.1');
    expect(url.pathname).toBe('/sign-in');
    const callback = url.searchParams.get('callbackUrl')!;
    expect(safeReturnPath(callback)).toBe(callback);
    const back = new URL(callback, 'http://127.0.0.1');
    expect(back.pathname).toBe('/systems/new');
    expect(back.searchParams.get('name')).toBe('Attic cinema (invented)');
    expect(back.searchParams.get('panel')).toBe('modes');
    expect(back.searchParams.get('resume')).toBe('1');
    expect(decodeDocument(back.searchParams.get('s')).doc).toEqual(state.doc);
  });

  it('a document too long for a link is kept in sessionStorage; the link carries only restore=1', () => {
    const long = { ...state, doc: { ...state.doc, notes: Array.from({ length: 1200 }, (_, i) => `seat${(i * 7919) % 10007}`).join(' ') } };
    expect(encodeURIComponent(editorPath(long)).length).toBeGreaterThan(MAX_RETURN_URL_CHARS);
    const { href, inLink } = signInToSaveHref(long);
    expect(inLink).toBe(false);
    expect(href.length).toBeLessThan(200);
    const callback = new URL(href, 'http://127.0.0.1').searchParams.get('callbackUrl')!;
    expect(new URL(callback, 'http://127.0.0.1').searchParams.get('restore')).toBe('1');

    const store = new Map<string, string>();
    const storage = { setItem: (k: string, v: string) => void store.set(k, v), getItem: (k: string) => store.get(k) ?? null, removeItem: (k: string) => void store.delete(k) };
    expect(keepPendingSystem(storage, long)).toBe(true);
    expect(takePendingSystem(storage)).toEqual({ doc: long.doc, name: long.name, panel: 'modes' });
    expect(takePendingSystem(storage)).toBeNull(); // taken once
  });
});

describe('safeReturnPath: only ever back to this site', () => {
  it('keeps a path on this site, query and hash included', () => {
    expect(safeReturnPath('/systems/new?s=AbC-$+&name=Den#x')).toBe('/systems/new?s=AbC-$+&name=Den#x');
    expect(safeReturnPath('/library')).toBe('/library');
  });
  it.each(['//evil.example/x', '/\\evil.example', '\\\\evil.example', 'https://evil.example/', 'javascript:alert(1)', '/\t/evil.example', 'evil.example', '', null, undefined])('refuses %j', (raw) => {
    expect(safeReturnPath(raw as string | null | undefined, '/library')).toBe('/library');
  });
  it('with the origin known, an absolute URL on it becomes its path; another origin falls back', () => {
    expect(safeReturnPath('http://127.0.0.1:3000/systems/new?panel=modes', '/', 'http://127.0.0.1:3000')).toBe('/systems/new?panel=modes');
    expect(safeReturnPath('http://127.0.0.1:3001/systems/new', '/', 'http://127.0.0.1:3000')).toBe('/');
  });
});
