import type { NextFunction, Request, Response } from "express";
import multer from "multer";
import { HttpError, invalidInput } from "../../lib/errors.ts";
import { MAX_UPLOAD_BYTES } from "../../services/images.ts";

// Mounted only on the upload routes, in memory: the bytes are re-encoded before anything is written.
const photoParser = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_UPLOAD_BYTES, files: 4, fields: 10, parts: 14 },
}).single("photo");

/** Parses one multipart `photo` (and its text fields) with our limits; a missing photo is a 400 naming the field. */
export function photoUpload(req: Request, res: Response, next: NextFunction) {
  photoParser(req, res, (error: unknown) => {
    if (error instanceof multer.MulterError) {
      if (error.code === "LIMIT_FILE_SIZE") return next(new HttpError(413, "payload_too_large", `A photo is at most ${MAX_UPLOAD_BYTES / 1024 / 1024} MB.`));
      return next(new HttpError(400, "invalid_upload", `The upload was refused: ${error.message}.`, { code: error.code, field: error.field }));
    }
    if (error) return next(error);
    if (!req.file) return next(invalidInput({ formErrors: [], fieldErrors: { photo: ["Attach a photo in the field named photo."] } }));
    next();
  });
}
