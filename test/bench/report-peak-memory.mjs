// Preloaded with `node --import` into a benchmarked process: prints its peak resident set on exit.
process.on('exit', () => {
  process.stderr.write(`\npeak_rss_kb=${process.resourceUsage().maxRSS}\n`);
});
