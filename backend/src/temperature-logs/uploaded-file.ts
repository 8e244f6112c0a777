/**
 * The part of a multer file this feature reads (multer's own types are not installed; the
 * interceptor keeps uploads in memory, so `buffer` is always set).
 */
export interface UploadedCsvFile {
  originalname: string;
  mimetype: string;
  size: number;
  buffer: Buffer;
}
