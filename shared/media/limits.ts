/** Limits for imagery, shared by the server's checks, the zod schemas and the upload screen. */
export const MediaLimits = {
  /** Default upload size; the server reads STARPROOF_UPLOAD_MAX_MB to change it. */
  defaultUploadMaxMb: 100,
  /** Default pixel limit (width × height) against decompression bombs; STARPROOF_UPLOAD_MAX_MEGAPIXELS changes it. */
  defaultMaxMegapixels: 100,
  altTextMax: 1000,
  creditMax: 300,
  sourceUrlMax: 2000,
  fileNameMax: 255,
  /** Objects one image may be linked to. */
  objectsMax: 20,
  searchMax: 120,
  pageSize: 48,
} as const;

/** The file types accepted, named as a person knows them (for messages and the file picker). */
export const ACCEPTED_IMAGE_TYPES = ['JPEG', 'PNG', 'WebP', 'AVIF', 'TIFF', 'GIF (still)'] as const;

/** The `accept` attribute of the file picker; the server checks content, never this. */
export const ACCEPT_ATTRIBUTE = 'image/jpeg,image/png,image/webp,image/avif,image/tiff,image/gif';
