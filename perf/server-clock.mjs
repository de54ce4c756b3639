// Preloaded into the served build by `npm run perf` only (node --import): the server's own time
// for each request, from the moment Node has parsed the request head to the moment the last byte
// of the response is handed to the socket ('finish'). The benchmarks read it as "server time",
// beside the round trip their client sees. One line per request, tab-separated:
//   method  url  status  milliseconds
// appended to $RUNGBOOK_SERVER_CLOCK in batches, after the response (never inside a request's own
// timing), and at least every 250 ms.
import fs from 'node:fs';
import http from 'node:http';

const file = process.env.RUNGBOOK_SERVER_CLOCK;
if (file) {
  const lines = [];
  const flush = () => {
    if (lines.length) fs.appendFileSync(file, lines.splice(0).join(''));
  };
  const emit = http.Server.prototype.emit;
  http.Server.prototype.emit = function (event, req, res, ...rest) {
    if (event === 'request') {
      const t0 = process.hrtime.bigint();
      res.once('finish', () => {
        lines.push(`${req.method}\t${req.url}\t${res.statusCode}\t${(Number(process.hrtime.bigint() - t0) / 1e6).toFixed(3)}\n`);
        if (lines.length >= 100) setImmediate(flush);
      });
    }
    return Reflect.apply(emit, this, [event, req, res, ...rest]);
  };
  setInterval(flush, 250).unref();
  process.on('exit', flush);
}
