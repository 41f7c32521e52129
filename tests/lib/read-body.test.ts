import { describe, expect, it } from 'vitest';
import { AppError } from '@/lib/errors';
import { readBodyBytes, readBodyText } from '@/lib/http';

// The one bounded body reader behind parseJson (JSON routes) and the measurement upload. Oracle: the bytes sent.

/** A POST whose body arrives in the given chunks (no Content-Length unless given). */
function streamed(chunks: number[][], headers: Record<string, string> = {}): Request {
  let pulled = 0;
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      const next = chunks[pulled++];
      if (next) controller.enqueue(new Uint8Array(next));
      else controller.close();
    },
  });
  return new Request('http://x/api', { method: 'POST', body, headers, duplex: 'half' } as RequestInit);
}

describe('readBodyBytes', () => {
  it('joins the chunks in order, byte for byte; a request without a body reads as no bytes', async () => {
    const bytes = await readBodyBytes(streamed([[1, 2], [3], [], [4, 5, 6]]), 6);
    expect(Array.from(bytes)).toEqual([1, 2, 3, 4, 5, 6]);
    expect((await readBodyBytes(new Request('http://x/api'), 10)).length).toBe(0);
  });
  it('refuses a declared Content-Length over the limit before reading, with the 413 of the API by default', async () => {
    const error = await readBodyBytes(streamed([[1]], { 'content-length': '11' }), 10).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(AppError);
    expect((error as AppError).status).toBe(413);
  });
  it('stops reading as soon as the received bytes pass the limit, with the caller’s own error', async () => {
    let pulls = 0;
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        pulls++;
        controller.enqueue(new Uint8Array(4));
      },
    });
    const request = new Request('http://x/api', { method: 'POST', body, duplex: 'half' } as RequestInit);
    await expect(readBodyBytes(request, 10, () => new Error('file too large'))).rejects.toThrow('file too large');
    expect(pulls).toBeLessThanOrEqual(4); // 3 chunks of 4 bytes pass 10 (a stream may pull one ahead); never the endless rest
  });
  it('takes a body of exactly the limit', async () => {
    expect((await readBodyBytes(streamed([[1, 2, 3], [4, 5]]), 5)).length).toBe(5);
  });
});

describe('readBodyText', () => {
  it('decodes UTF-8 whole even when a character is split between chunks ("é" is C3 A9)', async () => {
    expect(await readBodyText(streamed([[0x22, 0xc3], [0xa9, 0x22]]))).toBe('"é"');
  });
});
