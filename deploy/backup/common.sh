# Shared by the backup and restore scripts (sourced, not run).
# load_env FILE: exports KEY=VALUE lines of a systemd EnvironmentFile (values may hold spaces and ';').
load_env() {
  local file="$1" line
  [ -r "$file" ] || { echo "cannot read the settings file $file" >&2; return 1; }
  while IFS= read -r line || [ -n "$line" ]; do
    if [[ "$line" =~ ^[A-Za-z_][A-Za-z0-9_]*= ]]; then
      export "${line?}"
    fi
  done <"$file"
}

# prune DIR PATTERN DAYS: deletes files matching PATTERN in DIR older than DAYS days.
prune() {
  local dir="$1" pattern="$2" days="$3"
  find "$dir" -maxdepth 1 -type f -name "$pattern" -mtime "+$((days - 1))" -print -delete
}
