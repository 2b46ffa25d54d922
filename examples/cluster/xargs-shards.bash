# Sourced by scan-xargs.sh and suite-xargs.sh: K shards of one twinorbit command as K processes at
# a time with xargs -P, then the merge; exits as the merge does.
#   run_shards COMMAND MIN-ARGS USAGE EXAMPLE K OUT [OPTIONS...]
# MIN-ARGS counts K, OUT and the options the command needs; USAGE and EXAMPLE fill the usage line.
run_shards() {
    local command=$1 min=$2 usage=$3 example=$4
    shift 4
    if [ $# -lt "$min" ]; then
        echo "usage: $0 $usage   (e.g. $0 $example)" >&2
        exit 2
    fi
    local k=$1 out=$2
    shift 2
    local jar=${TWINORBIT_JAR:-harness/target/twinorbit.jar}

    seq 0 $((k - 1)) | xargs -P "$k" -I{} \
        java -jar "$jar" "$command" "$@" --threads 1 -q --resume --shard "{}/$k" --out "$out"
    java -jar "$jar" merge --out "$out"
}
