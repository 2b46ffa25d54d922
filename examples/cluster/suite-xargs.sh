#!/bin/bash
# The validation suite (its cases and the safe-use map) cut into K shards run as K processes at a
# time with xargs -P, then merged into the files one 'suite' run writes; exits as suite does
# (1 when a verdict fails).
#   examples/cluster/suite-xargs.sh K OUT [SUITE-OPTIONS...]
#   examples/cluster/suite-xargs.sh 3 suite-sharded --quick
# Run it again after an interruption: finished shards say so, the others resume.
set -euo pipefail
source "$(dirname "$0")/xargs-shards.bash"
run_shards suite 2 "K OUT [SUITE-OPTIONS...]" "3 suite-sharded --quick" "$@"
