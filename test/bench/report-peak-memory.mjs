// Preloaded with `node --import` into a benchmarked process: prints its peak resident set and the
// CPU time (user + system, all threads) it used, on exit.
process.on('exit', () => {
  const usage = process.resourceUsage();
  process.stderr.write(`\npeak_rss_kb=${usage.maxRSS}\ncpu_us=${usage.userCPUTime + usage.systemCPUTime}\n`);
});
