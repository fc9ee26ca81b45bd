// The load balancer in front of several app instances: Debian's nginx, run by us as an ordinary
// process (its own prefix, config, pid and log files under .data), never as the system service.
import { existsSync, mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { ROOT, aptInstall } from "./bootstrap.mjs";
import { startService, waitForHttp } from "./proc.mjs";

export const NGINX = process.env.NGINX_BIN ?? "/usr/sbin/nginx";

/** Installs nginx from Debian when it is missing (root only; otherwise says how). */
export function ensureNginx() {
  if (existsSync(NGINX)) return;
  aptInstall("nginx");
}

/**
 * nginx.conf for a balancer on 127.0.0.1:`port` over `upstreams` (ports of app instances on
 * 127.0.0.1). Requests go round-robin; an instance that refuses or fails a request that is safe to
 * repeat (GET, HEAD) is skipped and the request tried on the next one. X-Forwarded-For is
 * appended to, so the app's sign-in limit still sees the client's address as the last hop.
 */
export function nginxConfig({ port, upstreams, dir }) {
  const temp = (name) => join(dir, name);
  return `# Written by scripts/lib/balancer.mjs; edits here are overwritten.
worker_processes 1;
daemon off;
pid ${join(dir, "nginx.pid")};
error_log ${join(dir, "error.log")} warn;
${process.getuid?.() === 0 ? "user root root;\n" : ""}events { worker_connections 1024; }
http {
  access_log off;
  client_body_temp_path ${temp("client-body")};
  proxy_temp_path ${temp("proxy")};
  fastcgi_temp_path ${temp("fastcgi")};
  uwsgi_temp_path ${temp("uwsgi")};
  scgi_temp_path ${temp("scgi")};
  # Imports are up to 20 MB of CSV or XLSX; the app enforces its own limits and answers 413.
  client_max_body_size 64m;
  upstream filmsheet {
${upstreams.map((p) => `    server 127.0.0.1:${p} max_fails=2 fail_timeout=5s;`).join("\n")}
    keepalive 64;
    # Below Node's own 5 s keep-alive: nginx must never reuse a connection the app is closing
    # (a write sent on it could not be retried and would come back 502).
    keepalive_timeout 4s;
  }
  server {
    listen 127.0.0.1:${port};
    location / {
      proxy_pass http://filmsheet;
      proxy_http_version 1.1;
      proxy_set_header Connection "";
      proxy_set_header Host $http_host;
      proxy_set_header X-Forwarded-Host $http_host;
      proxy_set_header X-Forwarded-Proto $scheme;
      proxy_set_header X-Forwarded-For $proxy_add_x_forwarded_for;
      # Only idempotent requests move to another instance; a write is never sent twice.
      proxy_next_upstream error timeout http_502 http_503;
      proxy_next_upstream_tries 2;
      proxy_read_timeout 300s;
      proxy_buffering off;
    }
  }
}
`;
}

/** Starts nginx on 127.0.0.1:`port` in front of `upstreams`; files under `dir` (default .data/nginx-<port>). */
export function startBalancer(port, upstreams, { dir = join(ROOT, ".data", `nginx-${port}`) } = {}) {
  ensureNginx();
  for (const sub of ["", "client-body", "proxy", "fastcgi", "uwsgi", "scgi"]) mkdirSync(join(dir, sub), { recursive: true });
  const conf = join(dir, "nginx.conf");
  writeFileSync(conf, nginxConfig({ port, upstreams, dir }));
  // -e: the error log before the config is read (the default under /var/log may not be writable).
  const service = startService("nginx", NGINX, ["-p", dir, "-c", conf, "-e", join(dir, "error.log")], { cwd: dir });
  return { service, dir, ready: () => waitForHttp(`http://127.0.0.1:${port}/api/health`, { service, accept: (s) => s === 200, timeoutMs: 90000 }) };
}
