import { registerAs } from '@nestjs/config';
import { envInt } from './env.js';

export const uploadsConfig = registerAs('uploads', () => ({
  maxFileBytes: envInt('UPLOAD_MAX_FILE_BYTES', 1024 * 1024),
  maxFiles: envInt('UPLOAD_MAX_FILES', 250),
  maxTotalBytes: envInt('UPLOAD_MAX_TOTAL_BYTES', 20 * 1024 * 1024),
  allowedExtensions: ['.json'] as readonly string[],
}));
