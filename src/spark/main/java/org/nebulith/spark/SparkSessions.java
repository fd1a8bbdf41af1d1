package org.nebulith.spark;

import org.apache.spark.SparkConf;
import org.apache.spark.sql.SparkSession;

/** Spark sessions of this module. */
public final class SparkSessions {

    private SparkSessions() {
    }

    /**
     * The session of {@code spark-submit}: master and resources come from its command line; run
     * without one (plain {@code java}), it falls back to {@code local[*]}.
     *
     * @return the session
     */
    public static SparkSession submitted() {
        SparkConf conf = new SparkConf().setAppName("nebulith-survey");
        if (!conf.contains("spark.master")) {
            conf.setMaster("local[*]");
        }
        return SparkSession.builder().config(conf).getOrCreate();
    }

    /**
     * An in-process local session on the loopback interface without the web UI (tests, benchmark).
     *
     * @param cores worker threads ({@code local[cores]})
     * @return the session
     */
    public static SparkSession local(int cores) {
        return SparkSession.builder()
                .master("local[" + cores + "]")
                .appName("nebulith-survey-local")
                .config("spark.driver.host", "127.0.0.1")
                .config("spark.driver.bindAddress", "127.0.0.1")
                .config("spark.ui.enabled", "false")
                .config("spark.sql.shuffle.partitions", String.valueOf(2 * cores))
                .getOrCreate();
    }
}
