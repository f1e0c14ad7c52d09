/**
 * The files of a multipart/form-data body (RFC 7578), read from the raw bytes express.raw collected,
 * so the body's size limit (413) covers the whole set. Only file parts are taken; any other part is
 * refused, so a malformed or unexpected body gets a 400 naming what is wrong.
 */
// @ts-nocheck

import { HttpError } from '../http-error';

export interface UploadedPart {
  fileName: string;
  bytes: Buffer;
}

const CRLF = Buffer.from('\r\n');
const HEADER_END = Buffer.from('\r\n\r\n');

/** The boundary of a multipart/form-data content type, or null when the request is not multipart. */
export function multipartBoundary(contentType: string | undefined): string | null {
  if (!contentType || !/^multipart\/form-data\b/i.test(contentType)) return null;
  const match = /;\s*boundary=(?:"([^"]+)"|([^;\s]+))/i.exec(contentType);
  if (!match) throw new HttpError(400, 'invalid_request', 'The multipart upload names no boundary.');
  return match[1] ?? match[2];
}

/** Splits the body into its file parts, in the order sent. */
export function readMultipartFiles(body: Buffer, boundary: string): UploadedPart[] {
  const delimiter = Buffer.from(`--${boundary}`);
  const parts: UploadedPart[] = [];
  let at = body.indexOf(delimiter);
  if (at === -1) throw new HttpError(400, 'invalid_request', 'The multipart upload holds no part.');
  for (;;) {
    at += delimiter.length;
    if (body[at] === 45 && body[at + 1] === 45) break; // "--": the closing delimiter
    if (!body.subarray(at, at + 2).equals(CRLF))
      throw new HttpError(400, 'invalid_request', 'The multipart upload is malformed (no line end after a boundary).');
    const headerEnd = body.indexOf(HEADER_END, at + 2);
    if (headerEnd === -1) throw new HttpError(400, 'invalid_request', 'The multipart upload is malformed (a part has no header end).');
    const headers = body.subarray(at + 2, headerEnd).toString('utf8');
    const next = body.indexOf(Buffer.concat([CRLF, delimiter]), headerEnd + 4);
    if (next === -1) throw new HttpError(400, 'invalid_request', 'The multipart upload is cut short (no closing boundary).');
    const disposition = /^content-disposition:\s*form-data\s*;(.*)$/im.exec(headers)?.[1] ?? '';
    const fileName = /\bfilename\*?=(?:"((?:[^"\\]|\\.)*)"|([^;\s]+))/i.exec(disposition);
    const name = /\bname="([^"]*)"/i.exec(disposition)?.[1] ?? '';
    if (!fileName) throw new HttpError(400, 'invalid_request', `The multipart part "${name}" is not a file; send only files.`);
    parts.push({ fileName: (fileName[1] ?? fileName[2]).replace(/\\(.)/g, '$1'), bytes: body.subarray(headerEnd + 4, next) });
    at = next + CRLF.length;
  }
  if (parts.length === 0) throw new HttpError(400, 'invalid_request', 'The multipart upload holds no file.');
  return parts;
}
