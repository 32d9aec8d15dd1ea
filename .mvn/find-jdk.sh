# Sourced by ./mvnw, ./breakwater and .ci/run: points JAVA_HOME at a JDK 21 or newer.
# Order: JAVA_HOME if it is new enough, then `java` on the PATH, then the usual install folders.
# Prints a clear message and returns 1 when no JDK 21+ exists.

breakwater_java_major() {
  # $1 = path to a java binary; prints its feature version (17, 21, 25 ...) or nothing
  "$1" -XshowSettings:properties -version 2>&1 |
    sed -n 's/^ *java\.specification\.version = \([0-9][0-9]*\).*/\1/p' | head -n 1
}

breakwater_find_jdk() {
  local want=21 candidate major
  if [ -n "${JAVA_HOME:-}" ] && [ -x "$JAVA_HOME/bin/javac" ]; then
    major=$(breakwater_java_major "$JAVA_HOME/bin/java")
    if [ -n "$major" ] && [ "$major" -ge "$want" ]; then return 0; fi
  fi
  if command -v javac >/dev/null 2>&1; then
    candidate=$(dirname "$(dirname "$(readlink -f "$(command -v javac)")")")
    major=$(breakwater_java_major "$candidate/bin/java")
    if [ -n "$major" ] && [ "$major" -ge "$want" ]; then export JAVA_HOME="$candidate"; return 0; fi
  fi
  local best="" best_major=0 noglob=0
  case $- in *f*) noglob=1; set +f ;; esac   # callers may run with `set -f`
  for candidate in /usr/lib/jvm/* /usr/local/lib/jvm/* /opt/java/* /opt/jdk* "$HOME"/.sdkman/candidates/java/* "$HOME"/.jdks/*; do
    [ -x "$candidate/bin/javac" ] || continue
    major=$(breakwater_java_major "$candidate/bin/java")
    [ -n "$major" ] || continue
    if [ "$major" -ge "$want" ] && [ "$major" -gt "$best_major" ]; then best="$candidate"; best_major="$major"; fi
  done
  [ "$noglob" = 1 ] && set -f
  if [ -n "$best" ]; then export JAVA_HOME="$best"; return 0; fi
  {
    echo "breakwater: no JDK 21 or newer found."
    echo "  Looked at JAVA_HOME (${JAVA_HOME:-unset}), the javac on PATH and /usr/lib/jvm, /usr/local/lib/jvm, /opt."
    echo "  Install one (for example: apt-get install openjdk-21-jdk) or set JAVA_HOME to a JDK 21+."
  } >&2
  return 1
}
