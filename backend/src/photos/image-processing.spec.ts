import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { PhotoRejected, processPhoto } from './image-processing';

async function jpegWithGps(): Promise<Buffer> {
  return sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 40, g: 90, b: 120 } } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'TestCam' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '30/1 0/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '95/1 0/1 0/1' },
    })
    .toBuffer();
}

describe('processPhoto', () => {
  it('strips EXIF (GPS above all) from a JPEG', async () => {
    const input = await jpegWithGps();
    // The test image must really carry EXIF, or the check below proves nothing.
    expect((await sharp(input).metadata()).exif).toBeDefined();
    const out = await processPhoto(input);
    const meta = await sharp(out.bytes).metadata();
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(out.bytes.includes(Buffer.from('TestCam'))).toBe(false);
    expect([out.width, out.height]).toEqual([64, 48]);
  });

  it('refuses a non-image by its content, whatever its name', async () => {
    await expect(processPhoto(Buffer.from('<gpx></gpx>'))).rejects.toThrow(PhotoRejected);
    await expect(processPhoto(Buffer.from('%PDF-1.4\n%…'))).rejects.toThrow(/application\/pdf/);
  });
});
