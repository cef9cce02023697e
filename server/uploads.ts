/**
 * Pattern text arriving by upload (multipart field `file`) or pasted as JSON
 * `{ source }`. Only UTF-8 text is accepted, 1 MiB a file, 50 files.
 */
import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { HttpError } from './errors.js';
import { check } from './validate.js';

export const MAX_FILE_BYTES = 1024 * 1024;
export const MAX_FILES = 50;

export interface Source {
  name: string;
  source: string;
}

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_FILE_BYTES, files: MAX_FILES, fields: 20, parts: MAX_FILES + 20 },
}).array('file');

/** Runs multer only for multipart requests, so JSON bodies pass through untouched. */
export const acceptUploads: RequestHandler = (req, res, next) => {
  if (req.is('multipart/form-data')) upload(req, res, next);
  else next();
};

const utf8 = new TextDecoder('utf-8', { fatal: true });

/** The text of a file, or a 415 for anything that is not UTF-8 text (NUL bytes, invalid sequences). */
export function decodeText(name: string, bytes: Buffer): string {
  let text: string;
  try {
    if (bytes.includes(0)) throw new Error('NUL byte');
    text = utf8.decode(bytes);
  } catch {
    throw new HttpError(415, 'not-text', `${name} is not a text file; only UTF-8 pattern text is accepted.`, {
      file: name,
    });
  }
  return text.startsWith('\uFEFF') ? text.slice(1) : text;
}

const pasted = z.object({ source: z.string().min(1), name: z.string().max(255).optional() });

export function sourcesOf(req: Request, fallbackName = 'pasted.ffp'): Source[] {
  const files = (req.files as Express.Multer.File[] | undefined) ?? [];
  if (req.is('multipart/form-data')) {
    if (files.length === 0) throw new HttpError(400, 'invalid-input', 'Attach one or more files in the field "file".');
    return files.map((f) => ({ name: f.originalname, source: decodeText(f.originalname, f.buffer) }));
  }
  if (!req.is('application/json')) {
    throw new HttpError(
      415,
      'unsupported-media-type',
      'Send multipart/form-data with files, or JSON { "source": "..." }.',
    );
  }
  const body = check(pasted, req.body);
  if (Buffer.byteLength(body.source, 'utf8') > MAX_FILE_BYTES)
    throw new HttpError(413, 'too-large', 'A pattern may be at most 1 MiB.');
  if (body.source.includes('\0')) throw new HttpError(415, 'not-text', 'The text contains NUL characters.');
  return [{ name: body.name ?? fallbackName, source: body.source }];
}
