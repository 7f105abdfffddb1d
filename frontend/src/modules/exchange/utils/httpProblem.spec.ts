import { describe, expect, it } from 'vitest';
import { codeForHttpStatus, fileNameFromDisposition, readHttpProblem } from './httpProblem';

describe(readHttpProblem.name, () => {
  it('keeps the code, message and field of a domain refusal (shape of backend GraphqlExceptionFilter)', () => {
    expect(readHttpProblem(400, { code: 'BAD_USER_INPUT', message: 'the file is larger than 20 MB', field: 'file' })).toEqual({
      code: 'BAD_USER_INPUT',
      message: 'the file is larger than 20 MB',
      field: 'file',
    });
  });

  it("joins the messages of Nest's validation answer and takes the code from the status", () => {
    expect(readHttpProblem(400, { statusCode: 400, message: ['fileName must be a string', 'siteId must be a UUID'], error: 'Bad Request' })).toEqual({
      code: 'BAD_USER_INPUT',
      message: 'fileName must be a string; siteId must be a UUID',
    });
  });

  it('names an answer without a body by its status', () => {
    expect(readHttpProblem(404, null)).toEqual({ code: 'NOT_FOUND', message: 'the server answered 404' });
    expect(readHttpProblem(413, 'Payload Too Large').message).toBe('the file is too large for the server');
  });

  it('ignores a code it does not know and falls back to the status', () => {
    expect(readHttpProblem(503, { code: 'SERVICE_UNAVAILABLE', message: 'object store down' })).toEqual({
      code: 'INTERNAL_SERVER_ERROR',
      message: 'object store down',
    });
  });
});

describe(codeForHttpStatus.name, () => {
  it('maps the statuses the API uses', () => {
    expect([401, 403, 409, 429, 500].map(codeForHttpStatus)).toEqual(['UNAUTHENTICATED', 'FORBIDDEN', 'CONFLICT', 'TOO_MANY_REQUESTS', 'INTERNAL_SERVER_ERROR']);
  });
});

describe(fileNameFromDisposition.name, () => {
  it("prefers the RFC 6266 extended parameter, as the attachment route sends it", () => {
    expect(fileNameFromDisposition("inline; filename*=UTF-8''Trench%20log%20T-3%20%C3%A9.png", 'x')).toBe('Trench log T-3 é.png');
  });

  it('reads a quoted or bare file name, as the export routes send it', () => {
    expect(fileNameFromDisposition('attachment; filename="Velmora-Margin.stratochron.json"', 'x')).toBe('Velmora-Margin.stratochron.json');
    expect(fileNameFromDisposition('attachment; filename=sites.csv', 'x')).toBe('sites.csv');
  });

  it('falls back when there is no header or no name', () => {
    expect(fileNameFromDisposition(null, 'bundle.json')).toBe('bundle.json');
    expect(fileNameFromDisposition('attachment', 'bundle.json')).toBe('bundle.json');
  });
});
