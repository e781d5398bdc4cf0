import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.File;
import java.util.HashMap;
import java.util.Map;

/**
 * Prints the cost and the size of the full kill matrix: the wall times of a run that stops at each mutant's first
 * failure and of one that runs every reaching test ({@code run --every-test}), their ratio, the execute phases, the
 * test runs of each, the matrix (the suite's tests × the mutants that ran tests, the reaching pairs, the kill pairs),
 * and how many verdicts differ between the two runs.
 *
 *   java -cp target/changeling.jar:CLASSES MatrixFigures FIRST_KILL.json EVERY_TEST.json FIRST_KILL_MS EVERY_TEST_MS
 */
public final class MatrixFigures {

    public static void main(String[] args) throws Exception {
        ObjectMapper json = new ObjectMapper();
        JsonNode firstKill = json.readTree(new File(args[0]));
        JsonNode everyTest = json.readTree(new File(args[1]));
        double firstKillMillis = Double.parseDouble(args[2]);
        double everyTestMillis = Double.parseDouble(args[3]);
        System.out.printf("run, first failure ends a mutant  %8.1f s   (execute %.1f s, %d test runs)%n", firstKillMillis / 1000,
                execute(firstKill) / 1000, testRuns(firstKill));
        System.out.printf("run --every-test                  %8.1f s   (execute %.1f s, %d test runs)%n", everyTestMillis / 1000,
                execute(everyTest) / 1000, testRuns(everyTest));
        System.out.printf("ratio                             %8.2f     (target <= 3; execute phases alone %.2f)%n",
                everyTestMillis / firstKillMillis, execute(everyTest) / execute(firstKill));
        long mutants = 0;
        long reaching = 0;
        long kills = 0;
        for (JsonNode mutant : everyTest.get("mutants")) {
            JsonNode killers = mutant.path("killers");
            if (killers.isArray()) {
                mutants++;
                reaching += mutant.path("reachedBy").size();
                kills += killers.size();
            }
        }
        int tests = everyTest.get("tests").size();
        System.out.printf("kill matrix                       %d tests x %d mutants = %d cells; %d reaching pairs, %d kill pairs%n",
                tests, mutants, (long) tests * mutants, reaching, kills);
        // Each run orders a mutant's tests by its own baseline's times, so a mutant that fails one test and loops in
        // another can move between killed and timed out from run to run, with or without the matrix (verdicts.sh).
        System.out.printf("verdicts that differ              %8d     (each run orders the tests by its own baseline times)%n",
                differing(firstKill, everyTest));
    }

    private static double execute(JsonNode results) {
        return results.path("timings").path("execute").asDouble();
    }

    private static long testRuns(JsonNode results) {
        long runs = 0;
        for (JsonNode mutant : results.get("mutants")) {
            runs += mutant.path("testsRun").size();
        }
        return runs;
    }

    private static long differing(JsonNode one, JsonNode other) {
        Map<String, String> verdicts = new HashMap<>();
        one.get("mutants").forEach(mutant -> verdicts.put(mutant.path("id").asText(), mutant.path("verdict").asText()));
        long differing = 0;
        for (JsonNode mutant : other.get("mutants")) {
            String before = verdicts.get(mutant.path("id").asText());
            if (before != null && !before.equals(mutant.path("verdict").asText())) {
                differing++;
            }
        }
        return differing;
    }
}
