/**
 * The batch service ({@code hopstat serve --root DIR}): a persistent job queue for a shared
 * workstation, fed by an inbox directory and a loopback HTTP API, with a live dashboard.
 *
 * <h2>Jobs</h2>
 *
 * A job is a spec plus its run directory, made and run exactly as {@code hopstat run} does ({@link
 * hopstat.pool.LocalSession}): {@code DIR/jobs/<id>/run/} holds spec.json, run.json, the journal
 * and summary.csv/json, so every CLI command ({@code status}, {@code report}, {@code resume}) also
 * works on it. States and transitions: {@link hopstat.serve.JobState}; the durable record {@code
 * DIR/jobs/<id>/job.json}: {@link hopstat.serve.JobRecord} (format 1, written by temp file + fsync
 * + rename; every change timestamped from the injected clock). One job runs at a time with all the
 * service's threads, highest priority first, FIFO within a priority; a running job is not
 * pre-empted. After a crash or kill the job that was running is re-queued at the next start and
 * resumes from its journal (realisations already journaled are not run again; the result equals an
 * uninterrupted run's, byte for byte).
 *
 * <h2>Inbox</h2>
 *
 * See {@link hopstat.serve.internal.Inbox}: drop {@code NAME.json} or {@code NAME@PRIORITY.json},
 * written elsewhere (or as a dot-file) and renamed in; dot-files and other names are ignored. Bad
 * specs go to {@code DIR/rejected/} with {@code NAME.error.txt} holding the CLI's error lines.
 *
 * <h2>HTTP API (format 1)</h2>
 *
 * All answers are JSON ({@code application/json; charset=utf-8}) unless stated; errors are {@code
 * {"error": code, "message": text}}, bad input is 400 {@code
 * {"error":"invalid-input","violations":[{"field","value","reason","message"}]}} where {@code
 * message} is the CLI's line ({@code field: reason (got value)}).
 *
 * <pre>
 * GET  /                              dashboard (HTML; /dashboard.js, /dashboard.css)
 * GET  /api/service                   {"format","version","threads","tokenRequired","maxBodyBytes"}
 * GET  /api/jobs                      {"format":1,"jobs":[{job, progress, files}]} in submission order
 * POST /api/jobs[?priority=P]         body: the spec JSON (≤ 1 MiB, Content-Type: application/json)
 *                                     → 201 {"format":1,"job":{...}}, Location: /api/jobs/ID; 400; 413
 * GET  /api/jobs/ID                   {"format":1,"job":{... history},"progress":{planned, scheduled,
 *                                     done, failed, finished, fraction, adaptive, ratePerSecond, etaSeconds,
 *                                     nonQuantised},"files":{summaryCsv, summaryJson, report},"grid":[...],
 *                                     "quantities":[{name, integerValued, unit, description}],
 *                                     "plannedPerPoint", "points":[{index, coordinates, planned, done, failed,
 *                                     failureReasons, quantities:{NAME:{n, mean, stderr, ciLow, ciHigh,
 *                                     confidenceLevel, median, min, max[, nonQuantised, modalValue,
 *                                     modalFraction]}}}], "stopping"}
 * POST /api/jobs/ID/pause             200 (queued job now PAUSED) or 202 (running job stops after its
 * POST /api/jobs/ID/cancel            in-flight realisations); 409 if the state does not allow it
 * POST /api/jobs/ID/resume            PAUSED → QUEUED
 * GET  /api/jobs/ID/summary.csv       the summary of the journal so far, byte-identical to the file
 * GET  /api/jobs/ID/summary.json      `hopstat report` would write now
 * GET  /api/jobs/ID/report            report.html of the run directory if present, else 404
 * </pre>
 *
 * Non-finite numbers are {@code null}. Job {@code job} objects: {@code format, id, name, priority,
 * sequence, source, state, submitted, updated, message, history:[{at, from, to, reason}]}.
 *
 * <h2>Safety</h2>
 *
 * Binds 127.0.0.1 by default; any other address needs {@code --token-file}. With a token, every
 * request (dashboard included) needs {@code Authorization: Bearer TOKEN} or the cookie set by
 * opening {@code /?token=TOKEN} once; others get 401 and change nothing. Tokens are compared in
 * constant time (SHA-256 of both, then {@link java.security.MessageDigest#isEqual}). On a loopback
 * bind the Host header must name the loopback address (DNS rebinding); POSTs need a JSON content
 * type and a same-origin (or no) Origin header (cross-site forms). Bodies over 1 MiB get 413. Paths
 * are parsed strictly (segments of {@code [A-Za-z0-9._-]}, never {@code .} or {@code ..}; ids must
 * match {@link hopstat.serve.JobIds}), so no request reaches a file outside the root. One service
 * per root: an OS lock on {@code DIR/service.lock}.
 */
package hopstat.serve;
