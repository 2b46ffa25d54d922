#!/bin/bash
# The validation suite (its cases and the safe-use map) cut into K shards run as K processes at a
# time with xargs -P, then merged into the files one 'suite' run writes; exits as suite does
# (1 when a verdict fails).
#   examples/cluster/suite-xargs.sh K OUT [SUITE-OPTIONS...]
#   examples/cluster/suite-xargs.sh 3 suite-sharded --quick
# Run it again after an interruption: finished shards say so, the others resume.
set -euo pipefail
if [ $# -lt 2 ]; then
    echo "usage: $0 K OUT [SUITE-OPTIONS...]   (e.g. $0 3 suite-sharded --quick)" >&2
    exit 2
fi
K=$1
OUT=$2
shift 2
JAR=${TWINORBIT_JAR:-harness/target/twinorbit.jar}

seq 0 $((K - 1)) | xargs -P "$K" -I{} \
    java -jar "$JAR" suite "$@" --threads 1 -q --resume --shard "{}/$K" --out "$OUT"
java -jar "$JAR" merge --out "$OUT"
