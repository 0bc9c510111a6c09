/**
 * JMH benchmarks of the runtime (profile {@code bench}). Each benchmark group carries a peer
 * measured in the same run, so figures are read as ratios, not as absolute promises. Run:
 * {@code mvn -B -q -Pbench -pl runtime -am package -DskipTests && java -jar
 * runtime/target/benchmarks.jar <regex> -f 1 -wi 3 -i 5}.
 */
package org.precedence.bench;
