#!/bin/bash
# Survey throughput on a Spark standalone cluster against the local survey, on this machine: a master and
# one worker with 2 cores started as separate processes (as StandaloneClusterIT does), the README's
# spark-submit recipe on the demo catalogue, then `nebulith survey` with 2 threads on the same input.
# Prints both wall times, the draws per second per core and the load average; checks that the two
# survey.csv files are identical. Usage (from the repository root, after nothing else):
#   bash src/spark/bench-cluster.sh [DRAWS]      (default 100 draws per star; needs the Maven cache)
set -euo pipefail
DRAWS=${1:-100}
REPO=$(cd "$(dirname "$0")/../.." && pwd)
W=$(mktemp -d)
git clone -q "$REPO" "$W/repo"
cd "$W/repo"
nice mvn -B -q -o verify -DskipTests > "$W/build.log" 2>&1
SPARK_BUILD=$W/repo/target/spark-build/spark
(cd "$SPARK_BUILD" && mvn -B -q -o dependency:build-classpath -Dmdep.outputFile="$W/cp.txt" -Dmdep.includeScope=test > /dev/null)
FLAGS=$(grep -o "<spark.jvm.flags>[^<]*" src/spark/pom.xml | head -1 | sed 's/<spark.jvm.flags>//')
H=$W/spark-home
mkdir -p "$H/jars"
tr ':' '\n' < "$W/cp.txt" | grep '\.jar$' | grep -v '/nebulith' | while read -r j; do ln -sf "$j" "$H/jars/"; done
export SPARK_HOME=$H SPARK_SCALA_VERSION=2.13 SPARK_LOCAL_IP=127.0.0.1 SPARK_LOG_DIR=$W
spark() { java $FLAGS -Xmx768m -cp "$H/jars/*" "$@"; }
# a daemon in the background whose pid ($!) is the JVM's own, so that the trap below stops it
daemon() { (exec java $FLAGS -Xmx768m -cp "$H/jars/*" "$@") & }
free_port() { python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1])'; }
MPORT=$(free_port)
daemon org.apache.spark.deploy.master.Master --host 127.0.0.1 --port "$MPORT" --webui-port "$(free_port)" > "$W/master.log" 2>&1
MASTER=$!
until grep -q "I have been elected leader" "$W/master.log"; do sleep 1; done
daemon org.apache.spark.deploy.worker.Worker "spark://127.0.0.1:$MPORT" --host 127.0.0.1 --cores 2 --memory 1536m \
  --webui-port "$(free_port)" --work-dir "$W/work" > "$W/worker.log" 2>&1
WORKER=$!
trap 'kill $WORKER $MASTER 2>/dev/null || true; pkill -f "CoarseGrainedExecutorBackend.*$MPORT" 2>/dev/null || true' EXIT
until grep -q "Successfully registered with master" "$W/worker.log"; do sleep 1; done
STARS=$(grep -v '^#' presets/demo-catalogue.csv | tail -n +2 | grep -c .)
L0=$(cut -d' ' -f1 /proc/loadavg); T0=$(date +%s.%N)
spark org.apache.spark.deploy.SparkSubmit --master "spark://127.0.0.1:$MPORT" --class org.nebulith.spark.SparkSurveyMain \
  --executor-cores 2 --executor-memory 1g --total-executor-cores 2 --conf spark.ui.enabled=false \
  "$SPARK_BUILD/target/nebulith-spark.jar" --catalogue presets/demo-catalogue.csv --draws "$DRAWS" --seed 7 \
  --out "$W/cluster-out" > "$W/submit.log" 2>&1
T1=$(date +%s.%N); L1=$(cut -d' ' -f1 /proc/loadavg)
java -jar target/nebulith.jar survey -q --catalogue presets/demo-catalogue.csv --draws "$DRAWS" --seed 7 --threads 2 \
  --out "$W/local-out" > "$W/local.log" 2>&1
T2=$(date +%s.%N); L2=$(cut -d' ' -f1 /proc/loadavg)
N=$((STARS * DRAWS))
python3 - "$N" "$T0" "$T1" "$T2" "$L0" "$L1" "$L2" <<'PY'
import sys
n, t0, t1, t2 = int(sys.argv[1]), *map(float, sys.argv[2:5])
l0, l1, l2 = sys.argv[5:8]
c, l = t1 - t0, t2 - t1
print(f"{n} draws; cluster (spark-submit to exit, 2 executor cores): {c:.1f} s, {n / c / 2:.1f} draws/s per core, load {l0} -> {l1}")
print(f"local survey (2 threads): {l:.1f} s, {n / l / 2:.1f} draws/s per core, load {l1} -> {l2}")
PY
cmp -s "$W/cluster-out/survey.csv" "$W/local-out/survey.csv" && echo "survey.csv identical" || echo "survey.csv DIFFERS"
echo "logs in $W"
