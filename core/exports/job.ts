/**
 * An export built a piece at a time: `parts` yields text pieces lazily (typically one per record or row) and
 * `total` says how many it will yield, so a screen can build a large file in slices and show progress. Joined in
 * order, the parts are the whole file.
 */
export interface ExportJob {
  total: number;
  parts: Iterable<string>;
}

/** Runs a job to the end in one go (tests, Node, small files). */
export function joinExportJob(job: ExportJob): string {
  return [...job.parts].join('');
}
