# Sourced by the other scripts: local defaults for every setting. Anything already set wins.
ROOT=${ROOT:-$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)}
mkdir -p "$ROOT/.data"
# A checkout may pin its own ports (several checkouts on one machine): .data/ports.env
[ -f "$ROOT/.data/ports.env" ] && source "$ROOT/.data/ports.env"
export NEXT_TELEMETRY_DISABLED=1
export HM_PG_PORT=${HM_PG_PORT:-54329}
export HM_S3_PORT=${HM_S3_PORT:-4569}
export HM_SMTP_PORT=${HM_SMTP_PORT:-2525}
export HM_MAIL_HTTP_PORT=${HM_MAIL_HTTP_PORT:-2580}
export HM_APP_PORT=${HM_APP_PORT:-3000}
export APP_URL=${APP_URL:-http://localhost:$HM_APP_PORT}
# The one-machine topology (scripts/topology.sh): balancer, PgBouncer and the two app servers.
export HM_TOPO_PORT=${HM_TOPO_PORT:-3200}
export HM_PGB_PORT=${HM_PGB_PORT:-64310}
export HM_TOPO_APP_A_PORT=${HM_TOPO_APP_A_PORT:-33010}
export HM_TOPO_APP_B_PORT=${HM_TOPO_APP_B_PORT:-33020}
# Local runs are plain http on loopback, so the session cookie cannot be `secure` there.
export HM_INSECURE_COOKIES=${HM_INSECURE_COOKIES:-1}
# Secrets: generated once per checkout and kept in .data (ignored by git).
secret_file() { [ -s "$1" ] || head -c 48 /dev/urandom | base64 | tr -d '\n/+=' > "$1"; cat "$1"; }
export SESSION_SECRET=${SESSION_SECRET:-$(secret_file "$ROOT/.data/session-secret")}
export LABEL_SECRET=${LABEL_SECRET:-$(secret_file "$ROOT/.data/label-secret")}
export RECEIPT_SECRET=${RECEIPT_SECRET:-$(secret_file "$ROOT/.data/receipt-secret")}
# The key of the handoff hash chain (HMAC): kept outside the database, so its owner cannot re-link a rewritten chain.
export CHAIN_KEY=${CHAIN_KEY:-$(secret_file "$ROOT/.data/chain-key")}
# Object storage: the s3rver fake unless S3_ENDPOINT points elsewhere (s3rver's fixed key pair).
export S3_ENDPOINT=${S3_ENDPOINT:-http://127.0.0.1:$HM_S3_PORT}
export S3_PUBLIC_ENDPOINT=${S3_PUBLIC_ENDPOINT:-$S3_ENDPOINT}
export S3_REGION=${S3_REGION:-us-east-1}
export S3_BUCKET=${S3_BUCKET:-hitchmark-photos}
export S3_ACCESS_KEY_ID=${S3_ACCESS_KEY_ID:-S3RVER}
export S3_SECRET_ACCESS_KEY=${S3_SECRET_ACCESS_KEY:-S3RVER}
# E-mail: the SMTP fake unless SMTP_HOST points elsewhere.
export SMTP_HOST=${SMTP_HOST:-127.0.0.1}
export SMTP_PORT=${SMTP_PORT:-$HM_SMTP_PORT}
export MAIL_FROM=${MAIL_FROM:-"Hitchmark <no-reply@hitchmark.example>"}
