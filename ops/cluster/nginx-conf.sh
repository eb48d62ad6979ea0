#!/usr/bin/env bash
# Prints the nginx configuration of the several-nodes run (ops/cluster/up.sh writes it to .data/cluster/nginx/).
# TLS on loopback, round robin over the web nodes; each answer says which node gave it.
set -euo pipefail
source "$(dirname "$0")/env.sh"
ngx="$CL_DIR/nginx"

cat <<CONF
# Written by ops/cluster/nginx-conf.sh; edits are lost at the next ops/cluster/up.sh.
$(if [ "$(id -u)" = "0" ]; then echo "user www-data;"; fi)
worker_processes 1;
pid $ngx/nginx.pid;
error_log $CL_LOGS/nginx-error.log warn;
events { worker_connections 1024; }

http {
  log_format node '\$remote_addr [\$time_iso8601] "\$request" \$status \$body_bytes_sent upstream=\$upstream_addr \$upstream_response_time s';
  access_log $CL_LOGS/nginx-access.log node;
  client_body_temp_path $ngx/tmp/body;
  proxy_temp_path $ngx/tmp/proxy;
  fastcgi_temp_path $ngx/tmp/fastcgi;
  uwsgi_temp_path $ngx/tmp/uwsgi;
  scgi_temp_path $ngx/tmp/scgi;
  # Uploads are refused by the app past FILE_MAX_BYTES (15 MB); a little room for the multipart framing.
  client_max_body_size 20m;
  server_tokens off;

  # Round robin (nginx's default) over stateless web nodes: any node answers any request, since
  # sessions, queue and files are shared. A node that refuses connections is skipped for 5 s.
  upstream layerbook_web {
$(for port in $CL_WEB_PORTS; do echo "    server 127.0.0.1:$port max_fails=1 fail_timeout=5s;"; done)
    keepalive 16;
  }

  server {
    listen 127.0.0.1:$CL_HTTPS_PORT ssl;
    server_name localhost;
    ssl_certificate $CL_DIR/tls/cert.pem;
    ssl_certificate_key $CL_DIR/tls/key.pem;
    ssl_protocols TLSv1.2 TLSv1.3;

    location / {
      proxy_pass http://layerbook_web;
      proxy_http_version 1.1;
      proxy_set_header Connection "";
      proxy_set_header Host \$http_host;
      # nginx is the edge: what a client claims in X-Forwarded-For is replaced, not extended. The app
      # trusts one proxy hop (trust proxy = 1 in production): req.ip is the client, req.secure is true,
      # so the __Host- session cookie goes out with Secure.
      proxy_set_header X-Forwarded-For \$remote_addr;
      proxy_set_header X-Forwarded-Proto \$scheme;
      proxy_set_header X-Forwarded-Host \$host;
      proxy_read_timeout 120s;
      # Which web node answered (for the cluster check and for reading logs side by side).
      add_header X-Layerbook-Upstream \$upstream_addr always;
    }
  }
}
CONF
