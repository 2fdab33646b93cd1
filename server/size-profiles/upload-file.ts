import multer from 'multer';
import type { RequestHandler } from 'express';
import { AppError } from '../lib/app-error';

export const MAX_UPLOAD_BYTES = 256 * 1024;

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 10, fieldSize: 1024 },
}).single('file');

// Multer's own errors become the one error shape; a file over the limit is 413, anything else 400.
export const uploadFile: RequestHandler = (req, res, next) => {
  upload(req, res, (err: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE')
        return next(
          new AppError(
            413,
            'file_too_large',
            `The file is larger than ${MAX_UPLOAD_BYTES / 1024} kB; a size profile needs at most 200 rows`,
          ),
        );
      return next(
        new AppError(400, 'invalid_upload', `The upload could not be read: ${err.message}`, [
          { path: err.field ?? 'file', message: err.message },
        ]),
      );
    }
    next(
      new AppError(400, 'invalid_upload', 'The upload could not be read; send it as multipart/form-data with a file field named "file"'),
    );
  });
};
