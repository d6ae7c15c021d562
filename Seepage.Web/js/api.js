// Calls to the Seepage HTTP API (same origin). Failures become ApiError with the RFC 9457 problem details.

const BASE = 'api/v1';

/** An HTTP failure; `problem` holds the parsed problem-details body when the server sent one. */
export class ApiError extends Error {
  constructor(status, problem, message) {
    super(message);
    this.status = status;
    this.problem = problem;
  }
}

async function call(path, options = {}) {
  let response;
  try {
    response = await fetch(`${BASE}/${path}`, options);
  } catch (e) {
    if (e.name === 'AbortError') throw e;
    throw new ApiError(0, null, `The Seepage service could not be reached (${e.message}).`);
  }
  const type = response.headers.get('content-type') || '';
  const body = type.includes('json') ? await response.json().catch(() => null) : await response.text();
  if (!response.ok) {
    const problem = body && typeof body === 'object' ? body : null;
    const message = problem?.detail || problem?.title || describeStatus(response.status, body);
    throw new ApiError(response.status, problem, message);
  }
  return body;
}

function describeStatus(status, body) {
  if (status === 413) return 'The section document is larger than the service accepts (413).';
  if (status === 404) return 'Not found (404).';
  const text = typeof body === 'string' && body.length < 200 ? `: ${body}` : '';
  return `The service answered ${status}${text}.`;
}

function postJson(path, text, signal) {
  return call(path, { method: 'POST', headers: { 'content-type': 'application/json' }, body: text, signal });
}

const XLSX = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

export const api = {
  /** [{ name, title, description }] */
  examples: () => call('examples'),
  /** The section document of one shipped example. */
  example: name => call(`examples/${encodeURIComponent(name)}`),
  /** { valid, warnings } or ApiError(400) with field errors. */
  validate: text => postJson('sections/validate', text),
  /** The analysis result document (201); `signal` aborts the request (the service stops the work). */
  analyse: (text, signal) => postJson('analyses', text, signal),
  /** A section document read from a workbook (.xlsx) or CSV file; ApiError(400) keyed by cell. */
  importSection: file => call('sections/import', {
    method: 'POST', body: file,
    headers: { 'content-type': /\.xlsx$/i.test(file.name) ? XLSX : 'text/csv' },
  }),
  /** The result document of a stored analysis. */
  analysis: id => call(`analyses/${encodeURIComponent(id)}`),
  /** Starts a study in the background: 202 with the study (id, status, done/total). */
  startStudy: (request, signal) => postJson('studies?background=true', JSON.stringify(request), signal),
  /** A study's state and the rows finished so far. */
  study: (id, signal) => call(`studies/${encodeURIComponent(id)}`, { signal }),
  /** Asks the service to stop and remove a study (answers 404/405 where the service cannot). */
  deleteStudy: id => call(`studies/${encodeURIComponent(id)}`, { method: 'DELETE' }),
  /** The section document of a stored analysis, as posted. */
  section: id => call(`analyses/${encodeURIComponent(id)}/section`),
  /** Field data for drawing (nodes, triangles, heads, equipotentials, flow lines, walls). */
  field: (id, signal) => call(`analyses/${encodeURIComponent(id)}/field`, { signal }),
};
