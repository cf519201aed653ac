/** JMH benchmarks (not tests): run with {@code java -jar bench/target/benchmarks.jar}. */
package org.linemass.bench;
