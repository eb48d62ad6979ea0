import sharp from 'sharp';

/** Small real images made on the fly, so the tests carry no binary fixtures. */
export const pngImage = (width = 64, height = 48) =>
  sharp({ create: { width, height, channels: 3, background: '#b0894f' } })
    .png()
    .toBuffer();

export const jpegImage = (width = 64, height = 48, orientation?: number) => {
  const image = sharp({ create: { width, height, channels: 3, background: '#6d8a96' } }).jpeg();
  return (orientation ? image.withMetadata({ orientation }) : image).toBuffer();
};

/** Random pixels do not compress, so the PNG is about width × height × 3 bytes. */
export const noisyPng = (width: number, height: number) => {
  const pixels = Buffer.alloc(width * height * 3);
  for (let i = 0; i < pixels.length; i++) pixels[i] = (i * 7919 + (i >> 3) * 104729) % 251;
  return sharp(pixels, { raw: { width, height, channels: 3 } })
    .png({ compressionLevel: 0 })
    .toBuffer();
};

export const SVG = Buffer.from(
  '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script><rect width="10" height="10"/></svg>',
);
export const HTML = Buffer.from('<!doctype html><html><body><script>alert(document.cookie)</script></body></html>');
export const TEXT = Buffer.from('Ceiling: two coats of lime, one of wax.\n');

/** A JPEG as a phone camera writes it: EXIF with the maker, an orientation and a GPS position. */
export const jpegWithGps = (width = 64, height = 32) =>
  sharp({ create: { width, height, channels: 3, background: '#8a6d96' } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Trowelcam', Model: 'TC-1', Orientation: '6' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '40/1 44/1 5412/100', GPSLongitudeRef: 'W', GPSLongitude: '73/1 59/1 1176/100' },
    })
    .toBuffer();
