import { PHOTO_CONTENT_TYPES } from '@layerbook/contracts/types';

const megabytes = (bytes: number) => `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB`;

/**
 * What is wrong with a chosen logo before it is sent (the server still decodes it), or null.
 * The browser's type is only a hint; an unknown one is left for the server to judge.
 */
export function logoPickProblem(
  file: { readonly name: string; readonly size: number; readonly type: string },
  maxBytes: number,
): string | null {
  if (file.type && !(PHOTO_CONTENT_TYPES as readonly string[]).includes(file.type)) {
    return `${file.name} is not a JPEG, PNG or WebP image. Choose one of those.`;
  }
  if (file.size > maxBytes) return `${file.name} is larger than ${megabytes(maxBytes)}. Choose a smaller image.`;
  return null;
}
