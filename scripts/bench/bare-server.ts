// A bare node:http JSON endpoint: the yardstick the app's API is measured against in `npm run bench`.
import http from "node:http";

const port = Number(process.env.PORT ?? 3321);
http
  .createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c) => chunks.push(c));
    req.on("end", () => {
      const body = JSON.parse(Buffer.concat(chunks).toString() || "{}");
      res.writeHead(200, { "Content-Type": "application/json" });
      res.end(JSON.stringify({ ok: true, keys: Object.keys(body) }));
    });
  })
  .listen(port, "127.0.0.1", () => console.log(`bare server on ${port}`));
