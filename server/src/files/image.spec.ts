import sharp from 'sharp';
import { HttpError } from '../http/problem';
import { checkImage, safeName, THUMBNAIL_WIDTH } from './image';
import { HTML, jpegImage, jpegWithGps, pngImage, SVG, TEXT } from './test-images';

async function refusal(buffer: Buffer, originalname: string): Promise<{ status: number; fields: string[]; message: string }> {
  try {
    await checkImage({ buffer, originalname });
  } catch (error) {
    if (!(error instanceof HttpError)) throw error;
    return { status: error.status, fields: (error.errors ?? []).map((e) => e.field), message: error.errors?.[0]?.message ?? '' };
  }
  throw new Error('expected a refusal');
}

describe('checkImage', () => {
  it('accepts a PNG and a JPEG by their bytes and makes a WebP thumbnail', async () => {
    const png = await checkImage({ buffer: await pngImage(), originalname: 'hall.png' });
    expect(png).toMatchObject({ contentType: 'image/png', width: 64, height: 48, originalName: 'hall.png' });
    expect((await sharp(png.thumbnail).metadata()).format).toBe('webp');

    const jpeg = await checkImage({ buffer: await jpegImage(), originalname: 'Dining Room.JPEG' });
    expect(jpeg.contentType).toBe('image/jpeg');
  });

  it('reports the size as shown, after EXIF rotation, and never enlarges the thumbnail', async () => {
    // EXIF orientation 6 = rotate 90° clockwise to display (CIPA DC-008 / Exif 2.32, tag 0x0112).
    const image = await checkImage({ buffer: await jpegImage(64, 32, 6), originalname: 'portrait.jpg' });
    expect({ width: image.width, height: image.height }).toEqual({ width: 32, height: 64 });
    const thumb = await sharp(image.thumbnail).metadata();
    expect({ width: thumb.width, height: thumb.height }).toEqual({ width: 32, height: 64 });

    const big = await checkImage({ buffer: await pngImage(1200, 900), originalname: 'wide.png' });
    expect((await sharp(big.thumbnail).metadata()).width).toBe(THUMBNAIL_WIDTH);
  });

  it('keeps the original without its EXIF (GPS included), in its own format, with the rotation applied', async () => {
    const camera = await jpegWithGps();
    const before = await sharp(camera).metadata();
    // 0x8825 is the GPS IFD pointer (Exif 2.32, CIPA DC-008, §4.6.3), little-endian in an "II" file.
    expect(before.exif?.includes(Buffer.from([0x25, 0x88]))).toBe(true);

    const kept = await checkImage({ buffer: camera, originalname: 'site.jpg' });
    const after = await sharp(kept.bytes).metadata();
    expect(after.format).toBe('jpeg');
    expect({ exif: after.exif, xmp: after.xmp, iptc: after.iptc }).toEqual({ exif: undefined, xmp: undefined, iptc: undefined });
    expect(kept.bytes.includes(Buffer.from('Trowelcam'))).toBe(false);

    const turned = await checkImage({ buffer: await jpegImage(64, 32, 6), originalname: 'portrait.jpg' });
    const shown = await sharp(turned.bytes).metadata();
    expect({ width: shown.width, height: shown.height, orientation: shown.orientation }).toEqual({
      width: 32,
      height: 64,
      orientation: undefined,
    });
  });

  it.each([
    ['a text file renamed .jpg', TEXT, 'notes.jpg', /not an image we can read/],
    ['an SVG', SVG, 'logo.svg', /SVG and HTML/],
    ['an SVG renamed .png', SVG, 'logo.png', /SVG and HTML/],
    ['an HTML file', HTML, 'page.html', /SVG and HTML/],
    ['an HTML file renamed .jpg', HTML, 'page.jpg', /not an image we can read/],
  ])('refuses %s, naming the field', async (_what, buffer, name, message) => {
    const r = await refusal(buffer, name);
    expect(r).toMatchObject({ status: 400, fields: ['file'] });
    expect(r.message).toMatch(message);
  });

  it('refuses a real image whose name says another type', async () => {
    const r = await refusal(await pngImage(), 'photo.jpg');
    expect(r.status).toBe(400);
    expect(r.message).toBe('The file is named .jpg but holds a PNG image. Rename it to .png and try again.');
  });

  it('refuses a GIF (decodable, but not a photo format we keep) and an empty or missing file', async () => {
    const gif = await sharp({ create: { width: 4, height: 4, channels: 3, background: '#000' } })
      .gif()
      .toBuffer();
    expect((await refusal(gif, 'a.gif')).message).toMatch(/GIF images are not accepted/);
    expect((await refusal(Buffer.alloc(0), 'a.png')).message).toMatch(/Choose a JPEG, PNG or WebP photo/);
    await expect(checkImage(undefined)).rejects.toMatchObject({ status: 400 });
  });

  it('refuses a truncated JPEG whose header is fine', async () => {
    const whole = await jpegImage(400, 300);
    const r = await refusal(whole.subarray(0, Math.floor(whole.length / 2)), 'cut.jpg');
    expect(r).toMatchObject({ status: 400, fields: ['file'] });
  });

  it('keeps only a plain base name for the download name', () => {
    expect(safeName('..\\..\\etc/passwd.png', '.png')).toBe('passwd.png');
    expect(safeName('a"b\u0007.jpg', '.jpg')).toBe('ab.jpg');
    expect(safeName('', '.webp')).toBe('photo.webp');
  });
});
