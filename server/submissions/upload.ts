import multer from 'multer';
import type { RequestHandler } from 'express';
import { UploadMetaSchema, type UploadMeta } from '../../shared/api/submissions';
import type { LibraryEntry as EntryBody, Signal } from '../../shared/libraryEntry';
import { LibraryEntrySchema } from '../../shared/libraryEntry';
import type { Mixture } from '../../shared/mixture';
import { InputError, mixtureParseFile } from '../../matching/io';
import { spectrumPickPeaks } from '../../matching/spectrum';
import { AppError, badRequest } from '../errors/AppError';
import { zodIssues } from '../errors/validate';
import type { Proposal } from './service';

const ALLOWED_EXT = new Set(['csv', 'tsv', 'txt', 'jdx', 'dx', 'jcamp']);
const MAX_SIGNALS = 300;

/** Memory storage: files are small (size-limited) and never written to disk unparsed. */
export function uploadMiddleware(maxBytes: number): RequestHandler {
  const inner = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 4, fieldSize: 256 * 1024, parts: 6 } }).single('file');
  return (req, res, next) => {
    inner(req, res, (err?: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new AppError(413, 'file_too_large', `file: larger than the upload limit of ${maxBytes} bytes`, { issues: [fileIssue(`larger than ${maxBytes} bytes`)] }));
        const field = err.field ?? 'file';
        return next(badRequest(`${field}: ${err.message}`, [{ field, message: err.message }]));
      }
      // busboy's own errors (truncated or malformed multipart) are the client's fault.
      return next(badRequest(`body: malformed multipart form (${(err as Error).message})`, [{ field: '(body)', message: 'malformed multipart form' }]));
    });
  };
}

const fileIssue = (message: string, line?: number) => ({ field: 'file', ...(line ? { line } : {}), message });

/**
 * Bytes → text. UTF-8 (BOM stripped) or UTF-16 with a BOM; bytes that are not UTF-8 are read as
 * Latin-1, which older instrument exports use. NUL bytes mean binary: rejected.
 */
export function uploadDecodeText(buf: Buffer): string {
  if (buf.length >= 2 && ((buf[0] === 0xff && buf[1] === 0xfe) || (buf[0] === 0xfe && buf[1] === 0xff))) {
    const le = buf[0] === 0xff;
    const body = buf.subarray(2);
    const swapped = le ? body : Buffer.from(body).swap16();
    return swapped.toString('utf16le');
  }
  if (buf.includes(0)) throw new AppError(415, 'unsupported_file', 'file: binary content; send a text peak list (.csv, .tsv, .txt) or JCAMP-DX (.jdx, .dx)', { issues: [fileIssue('binary content')] });
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(buf);
  } catch {
    text = buf.toString('latin1');
  }
  return text.replace(/^\uFEFF/, '');
}

/** Parses the multipart `meta` field; errors name "meta.<field>". */
export function uploadParseMeta(raw: unknown): UploadMeta {
  if (typeof raw !== 'string' || raw.trim() === '') throw badRequest('meta: required (JSON text with the entry name, formula, solvent, mhz, ...)', [{ field: 'meta', message: 'required' }]);
  let json: unknown;
  try {
    json = JSON.parse(raw);
  } catch {
    throw badRequest('meta: not valid JSON', [{ field: 'meta', message: 'not valid JSON' }]);
  }
  const r = UploadMetaSchema.safeParse(json);
  if (!r.success) {
    const issues = zodIssues(r.error, 'meta');
    throw badRequest(`upload: ${issues[0].field}: ${issues[0].message}`, issues);
  }
  return r.data;
}

/** Peaks of a parsed file: a peak list as given, a spectrum through the engine's peak picking. */
function peaksOf(mixture: Mixture): { shift: number; intensity: number }[] {
  if (mixture.kind === 'peaks') return mixture.peaks.map((p) => ({ shift: p.shift, intensity: p.intensity }));
  const picked = spectrumPickPeaks(mixture);
  return picked.peaks.map((p) => ({ shift: p.shift, intensity: Math.abs(p.integral) }));
}

/**
 * An uploaded file + meta → a proposal. Every peak becomes a singlet; its nuclei count is its
 * share of the summed intensity times `totalNuclei`, or its ratio to the smallest peak, rounded
 * (at least 1). The curator sees the formula check flag counts that do not add up.
 */
export function uploadToProposal(file: Express.Multer.File | undefined, metaRaw: unknown): Proposal {
  if (!file) throw badRequest('file: required (multipart field "file")', [fileIssue('required')]);
  const meta = uploadParseMeta(metaRaw);
  const name = file.originalname || 'upload';
  const ext = name.includes('.') ? name.split('.').pop()!.toLowerCase() : '';
  if (!ALLOWED_EXT.has(ext)) {
    throw new AppError(415, 'unsupported_file', `file: unsupported type "${ext ? '.' + ext : '(no extension)'}"; send .csv, .tsv, .txt, .jdx or .dx`, { issues: [fileIssue(`unsupported type .${ext}`)] });
  }
  const text = uploadDecodeText(file.buffer);
  if (text.trim() === '') throw badRequest('file: empty', [fileIssue('empty')]);
  let mixture: Mixture;
  try {
    mixture = mixtureParseFile(name, text, { name: meta.entry.name, solvent: meta.entry.solvent, mhz: meta.entry.mhz, kind: ext === 'jdx' || ext === 'dx' || ext === 'jcamp' ? undefined : 'peaks' });
  } catch (e) {
    if (e instanceof InputError) {
      const issues = e.issues.map((i) => ({ field: i.field && i.field !== 'file' ? `file.${i.field}` : 'file', ...(i.line !== undefined ? { line: i.line } : {}), message: i.message }));
      throw badRequest(`file: ${e.message}`, issues);
    }
    if (e instanceof RangeError || e instanceof TypeError) throw badRequest(`file: ${e.message}`, [fileIssue(e.message)]);
    throw e;
  }
  let peaks: { shift: number; intensity: number }[];
  try {
    peaks = peaksOf(mixture).filter((p) => Number.isFinite(p.shift) && Number.isFinite(p.intensity));
  } catch (e) {
    if (e instanceof RangeError || e instanceof TypeError) throw badRequest(`file: ${e.message}`, [fileIssue(e.message)]);
    throw e;
  }
  if (peaks.length === 0) throw badRequest('file: no peaks found', [fileIssue('no peaks found')]);
  if (peaks.length > MAX_SIGNALS) throw badRequest(`file: ${peaks.length} peaks; an entry holds at most ${MAX_SIGNALS}`, [fileIssue(`more than ${MAX_SIGNALS} peaks`)]);

  const signals = peaksToSignals(peaks, mixture.nucleus, meta.totalNuclei);
  const candidate = { ...meta.entry, signals };
  const parsed = LibraryEntrySchema.safeParse(candidate);
  if (!parsed.success) {
    const issues = zodIssues(parsed.error, 'entry');
    throw badRequest(`upload: ${issues[0].field}: ${issues[0].message}`, issues);
  }
  const format = ext === 'jdx' || ext === 'dx' || ext === 'jcamp' || text.trimStart().startsWith('##') ? 'jcamp' : 'peaklist';
  return { id: meta.id, kind: meta.kind, baseRevision: meta.baseRevision, entry: parsed.data as EntryBody, note: meta.note, sourceFormat: format, fileName: name.slice(0, 255) };
}

export function peaksToSignals(peaks: { shift: number; intensity: number }[], nucleus: '1H' | '13C', totalNuclei?: number): Signal[] {
  const sorted = [...peaks].sort((a, b) => a.shift - b.shift);
  const positive = sorted.map((p) => Math.max(p.intensity, 0));
  const sum = positive.reduce((s, x) => s + x, 0);
  const min = Math.min(...positive.filter((x) => x > 0));
  const nucleiOf = (x: number): number => {
    if (!(sum > 0) || !(x > 0)) return 1;
    const n = totalNuclei ? (x / sum) * totalNuclei : x / min;
    return Math.min(99, Math.max(1, Math.round(n)));
  };
  return sorted.map((p, i) => {
    const shift = Math.round(p.shift * 10000) / 10000;
    return nucleus === '1H'
      ? { nucleus: '1H' as const, shift, multiplicity: 's', j: [], nuclei: nucleiOf(positive[i]) }
      : { nucleus: '13C' as const, shift, nuclei: 1 };
  });
}
