#!/bin/bash
# usage: iso.sh OUTDIR ROUNDS REPEATS ROWSFILE NAME=JAR...
out=$1; rounds=$2; reps=$3; rows=$4; shift 4
mkdir -p "$out"
for rep in $(seq 1 $reps); do
  while IFS= read -r row; do
    [ -z "$row" ] && continue
    for spec in "$@"; do
      name=${spec%%=*}; jar=${spec#*=}
      java -cp "$jar" dev.noninertial.bench.PairedRatios $rounds "^\\Q$row\\E\$" >> "$out/$name-$rep.txt" 2>>"$out/err.txt"
    done
  done < "$rows"
  echo "$(date -u +%H:%M:%S) rep $rep done, load $(cut -d' ' -f1-3 /proc/loadavg)" >> "$out/log.txt"
done
