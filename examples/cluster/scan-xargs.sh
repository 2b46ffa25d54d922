#!/bin/bash
# The same on one machine: K shards as K processes at a time with xargs -P, then the merge.
#   examples/cluster/scan-xargs.sh K OUT SCAN-OPTIONS...
#   examples/cluster/scan-xargs.sh 3 mirror-sharded --field mirror --pitch 45,70
# Run it again after an interruption: finished shards say so, the others resume.
set -euo pipefail
if [ $# -lt 3 ]; then
    echo "usage: $0 K OUT SCAN-OPTIONS...   (e.g. $0 3 mirror-sharded --field mirror)" >&2
    exit 2
fi
K=$1
OUT=$2
shift 2
JAR=${TWINORBIT_JAR:-harness/target/twinorbit.jar}

seq 0 $((K - 1)) | xargs -P "$K" -I{} \
    java -jar "$JAR" scan "$@" --threads 1 -q --resume --shard "{}/$K" --out "$OUT"
java -jar "$JAR" merge --out "$OUT"
