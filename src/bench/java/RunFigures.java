import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.File;
import java.util.ArrayList;
import java.util.List;

/**
 * Prints the figures of a timed run next to its Maven baseline: the ratio of wall times, mutants per
 * second, the time by phase, and the engine's overhead = wall time ÷ (baseline time + the sum of the
 * test times it executed ÷ workers), where a test's time is its own time in the baseline; and the same
 * overhead once more with the time that tests stopped at a deadline ran until they were stopped (a
 * looping test does run for its whole allowance; only the worker's restart after it is the engine's).
 */
public final class RunFigures {

    public static void main(String[] args) throws Exception {
        JsonNode results = new ObjectMapper().readTree(new File(args[0]));
        double mavenMillis = Double.parseDouble(args[1]);
        double runMillis = Double.parseDouble(args[2]);
        String target = args.length > 3 ? args[3] : "4";
        // A mutant's tests are stored as numbers into "tests" (docs/results-format.md).
        List<Double> testMillis = new ArrayList<>();
        results.get("tests").forEach(test -> testMillis.add(test.get("millis").asDouble()));
        int mutants = results.get("mutants").size();
        double executed = 0;
        double stopped = 0;
        int testRuns = 0;
        for (JsonNode mutant : results.get("mutants")) {
            if ("timed-out".equals(mutant.path("verdict").asText())) {
                stopped += mutant.path("millis").asDouble();
            }
            for (JsonNode test : mutant.get("testsRun")) {
                executed += test.isInt() ? testMillis.get(test.asInt()) : 0.0;
                testRuns++;
            }
        }
        JsonNode timings = results.get("timings");
        int workers = results.get("settings").get("workers").asInt();
        double baseline = timings.path("baseline").asDouble();
        double ideal = baseline + executed / workers;
        System.out.printf("mvn -q test            %8.1f s%n", mavenMillis / 1000);
        System.out.printf("changeling run         %8.1f s   (%.2f x mvn test; target <= %s)%n", runMillis / 1000, runMillis / mavenMillis,
                target);
        System.out.printf("mutants                %8d     (%.1f per second of the whole run)%n", mutants, mutants / (runMillis / 1000));
        System.out.printf("test runs              %8d     (their baseline times add up to %.1f s)%n", testRuns, executed / 1000);
        for (var phase : timings.properties()) {
            System.out.printf("  %-20s %8.1f s%n", phase.getKey(), phase.getValue().asDouble() / 1000);
        }
        System.out.printf("engine overhead        %8.2f     (total %.1f s ÷ (baseline %.1f s + tests %.1f s ÷ %d workers); target <= 1.3)%n",
                timings.path("total").asDouble() / ideal, timings.path("total").asDouble() / 1000, baseline / 1000, executed / 1000, workers);
        System.out.printf("  without maven        %8.2f%n", (timings.path("total").asDouble() - timings.path("maven").asDouble()) / ideal);
        System.out.printf("  counting looping tests %6.2f     (their %.1f s until stopped counted as test time)%n",
                timings.path("total").asDouble() / (ideal + stopped / workers), stopped / 1000);
    }
}
