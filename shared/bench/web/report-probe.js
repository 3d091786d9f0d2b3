// Keystroke-to-report probe, installed in the page before the app's scripts (addInitScript).
// A digit keydown starts a measurement (the event's own timestamp); the first DOM mutation after
// it that changes the report's mass figure ends it. The next animation frame after that is also
// noted (about when the new figure is painted).
(() => {
  const probe = { armed: false, pending: null, samples: [], longTasks: [] };
  new PerformanceObserver((list) => {
    for (const t of list.getEntries()) probe.longTasks.push({ startTime: t.startTime, duration: t.duration });
  }).observe({ type: 'longtask', buffered: true });
  performance.setResourceTimingBufferSize(10000);
  window.__twReportProbe = probe;
  const massText = () => (document.querySelector('[data-testid="report-mass"]')?.textContent ?? '').trim();
  document.addEventListener(
    'keydown',
    (event) => {
      if (!probe.armed || !/^[0-9]$/.test(event.key)) return;
      probe.pending = { start: event.timeStamp, before: massText() };
    },
    true,
  );
  new MutationObserver(() => {
    const pending = probe.pending;
    if (!pending) return;
    const now = massText();
    if (!now || now === pending.before) return;
    probe.pending = null;
    const end = performance.now();
    const sample = { domMs: end - pending.start, frameMs: null, before: pending.before, after: now };
    // Where the time went: the analyze request that answered, and main-thread tasks over 50 ms.
    const request = performance
      .getEntriesByType('resource')
      .filter((e) => e.name.includes('/api/v1/analyze') && e.startTime >= pending.start && e.responseEnd <= end)
      .pop();
    if (request)
      Object.assign(sample, { requestStartMs: request.startTime - pending.start, requestMs: request.responseEnd - request.startTime });
    sample.longTaskMs = probe.longTasks
      .filter((t) => t.startTime + t.duration > pending.start && t.startTime < end)
      .reduce((s, t) => s + t.duration, 0);
    requestAnimationFrame(() => {
      sample.frameMs = performance.now() - pending.start;
      probe.samples.push(sample);
    });
  }).observe(document, { subtree: true, childList: true, characterData: true });
})();
