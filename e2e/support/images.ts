import sharp from 'sharp';

/** A small real photo made on the fly (a warm plaster colour with a darker band), so journeys carry no binary fixtures. */
export async function boardPhotoPng(width = 320, height = 240): Promise<Buffer> {
  const band = await sharp({ create: { width, height: Math.round(height / 3), channels: 3, background: '#7a5b3a' } })
    .png()
    .toBuffer();
  return sharp({ create: { width, height, channels: 3, background: '#c9b08a' } })
    .composite([{ input: band, top: Math.round(height / 3), left: 0 }])
    .png()
    .toBuffer();
}
