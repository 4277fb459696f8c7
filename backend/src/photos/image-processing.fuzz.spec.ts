import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PhotoRejected, processPhoto } from './image-processing';

// Arbitrary bytes, often behind a real image signature: a photo is either re-encoded or refused with
// PhotoRejected (a 400 on the route), never anything else. sharp is slow, so fewer runs.
describe('photo processing under fuzzing (fast-check)', () => {
  it('re-encodes or refuses with PhotoRejected, whatever the bytes', async () => {
    const signatures = [
      [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a],
      [0xff, 0xd8, 0xff, 0xe0],
      [0x47, 0x49, 0x46, 0x38, 0x39, 0x61],
      [0x52, 0x49, 0x46, 0x46, 0x00, 0x00, 0x00, 0x00, 0x57, 0x45, 0x42, 0x50],
      [0x49, 0x49, 0x2a, 0x00],
      [],
    ].map((s) => Buffer.from(s));
    const bytes = fc
      .tuple(fc.constantFrom(...signatures), fc.uint8Array({ maxLength: 300 }))
      .map(([head, rest]) => Buffer.concat([head, Buffer.from(rest)]));
    await fc.assert(
      fc.asyncProperty(bytes, async (input) => {
        try {
          const out = await processPhoto(input);
          expect(out.contentType).toBe('image/jpeg');
        } catch (e) {
          expect(e, String(e)).toBeInstanceOf(PhotoRejected);
          expect((e as Error).message.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 100 },
    );
  });
});
