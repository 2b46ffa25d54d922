#!/bin/bash
# The same on one machine: K shards as K processes at a time with xargs -P, then the merge.
#   examples/cluster/scan-xargs.sh K OUT SCAN-OPTIONS...
#   examples/cluster/scan-xargs.sh 3 mirror-sharded --field mirror --pitch 45,70
# Run it again after an interruption: finished shards say so, the others resume.
set -euo pipefail
source "$(dirname "$0")/xargs-shards.bash"
run_shards scan 3 "K OUT SCAN-OPTIONS..." "3 mirror-sharded --field mirror" "$@"
