// Per-file and per-request upload limits, shared so the form can warn before sending.
export const uploadLimits = {
  maxFileBytes: 25 * 1024 * 1024,
  maxFilesPerRequest: 10,
  // Everything one request may hold, all revisions and evidence together.
  maxRequestTotalBytes: 200 * 1024 * 1024,
} as const;
