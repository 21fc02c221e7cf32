#!/usr/bin/env bash
# The local fake SMTP server (smtp-server on 127.0.0.1) that receives every
# mail Hoopline sends and stores it, one .eml per message plus index.jsonl.
#
#   scripts/mail-fake.sh start [main|test]   start in the background (or reuse)
#   scripts/mail-fake.sh stop  [main|test]
#   scripts/mail-fake.sh status [main|test]
#   scripts/mail-fake.sh folder [main|test]  print where mail is stored
#
# main: port HOOPLINE_SMTP_PORT (default 2525), mail in .data/mail
# test: port HOOPLINE_SMTP_TEST_PORT (default 2535), mail in .data/mail-test
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cmd="${1:-start}"
instance="${2:-main}"
case "$instance" in
  main) PORT="${HOOPLINE_SMTP_PORT:-2525}"; FOLDER="$ROOT/.data/mail" ;;
  test) PORT="${HOOPLINE_SMTP_TEST_PORT:-2535}"; FOLDER="$ROOT/.data/mail-test" ;;
  *) echo "mail-fake.sh: unknown instance '$instance' (main or test)" >&2; exit 2 ;;
esac
PIDFILE="$ROOT/.data/mail-fake-$instance.pid"
LOG="$ROOT/.data/mail-fake-$instance.log"
say() { echo "[mail:$instance] $*" >&2; }

running() { [[ -f "$PIDFILE" ]] && kill -0 "$(cat "$PIDFILE")" 2>/dev/null; }

case "$cmd" in
  start)
    mkdir -p "$ROOT/.data"
    if running; then say "already running on 127.0.0.1:$PORT (mail in $FOLDER)"; exit 0; fi
    # exec: the background job is node itself, so its PID is the one stop signals.
    (cd "$ROOT/apps/api" && exec nohup node --import tsx src/mail/fake-smtp-main.ts --port "$PORT" --folder "$FOLDER" >"$LOG" 2>&1) &
    echo $! >"$PIDFILE"
    for _ in $(seq 1 50); do
      if grep -q "listening" "$LOG" 2>/dev/null; then say "listening on 127.0.0.1:$PORT, mail in $FOLDER"; exit 0; fi
      if ! running; then say "failed to start:"; cat "$LOG" >&2; exit 1; fi
      sleep 0.2
    done
    say "did not report listening in 10 s; see $LOG"; exit 1 ;;
  stop)
    if running; then kill "$(cat "$PIDFILE")"; rm -f "$PIDFILE"; say "stopped"; else rm -f "$PIDFILE"; say "not running"; fi ;;
  status)
    if running; then echo "running on 127.0.0.1:$PORT (pid $(cat "$PIDFILE")), mail in $FOLDER"; else echo "not running"; exit 1; fi ;;
  folder) echo "$FOLDER" ;;
  *) echo "usage: scripts/mail-fake.sh start|stop|status|folder [main|test]" >&2; exit 2 ;;
esac
