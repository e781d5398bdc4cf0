import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.File;
import java.util.Map;
import java.util.TreeMap;

/**
 * Compares two results files mutant by mutant (by fingerprint) and prints every mutant whose verdict moved, the
 * mutants only one side has, and the detected count of each side.
 *
 *   java -cp target/changeling.jar:CLASSES VerdictDiff BEFORE.json AFTER.json
 */
public final class VerdictDiff {

    public static void main(String[] args) throws Exception {
        Map<String, JsonNode> before = byId(args[0]);
        Map<String, JsonNode> after = byId(args[1]);
        int moved = 0;
        for (Map.Entry<String, JsonNode> entry : before.entrySet()) {
            JsonNode other = after.get(entry.getKey());
            if (other == null) {
                System.out.println("only before: " + describe(entry.getValue()));
            } else if (!other.path("verdict").asText().equals(entry.getValue().path("verdict").asText())) {
                moved++;
                System.out.println("moved: " + describe(entry.getValue()) + " -> " + other.path("verdict").asText()
                        + "  (" + first(other.path("detail").asText()) + ")");
            }
        }
        after.keySet().stream().filter(id -> !before.containsKey(id))
                .forEach(id -> System.out.println("only after: " + describe(after.get(id))));
        System.out.printf("mutants: %d before, %d after; verdicts moved: %d; detected: %d before, %d after%n",
                before.size(), after.size(), moved, detected(before), detected(after));
    }

    private static Map<String, JsonNode> byId(String file) throws Exception {
        Map<String, JsonNode> mutants = new TreeMap<>();
        new ObjectMapper().readTree(new File(file)).path("mutants").forEach(mutant -> mutants.put(mutant.path("id").asText(), mutant));
        return mutants;
    }

    private static long detected(Map<String, JsonNode> mutants) {
        return mutants.values().stream()
                .map(mutant -> mutant.path("verdict").asText())
                .filter(verdict -> verdict.equals("killed") || verdict.equals("timed-out") || verdict.equals("crashed"))
                .count();
    }

    private static String describe(JsonNode mutant) {
        return mutant.path("id").asText().substring(0, 8) + " " + mutant.path("file").asText() + " "
                + mutant.path("verdict").asText();
    }

    private static String first(String text) {
        int newline = text.indexOf('\n');
        return newline < 0 ? text : text.substring(0, newline);
    }
}
