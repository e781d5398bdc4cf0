import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.File;
import java.util.Locale;

/**
 * Prints what a run's results file says about unproductive code and survivors that compile alike:
 * the total of mutants, the points not made by reason, the survivors compared, the proposed
 * equivalents by how they matched, the duplicates, and the comparison's share of the run's time.
 */
public final class AlikeFigures {

    public static void main(String[] args) throws Exception {
        JsonNode results = new ObjectMapper().readTree(new File(args[0]));
        int mutants = results.get("mutants").size();
        int survivors = 0;
        for (JsonNode mutant : results.get("mutants")) {
            if ("survived".equals(mutant.path("verdict").asText())) {
                survivors++;
            }
        }
        int notMade = 0;
        StringBuilder reasons = new StringBuilder();
        for (var reason : results.path("notMade").properties()) {
            notMade += reason.getValue().asInt();
            reasons.append(reasons.length() == 0 ? "" : ", ").append(reason.getValue().asInt()).append(' ').append(reason.getKey());
        }
        JsonNode alike = results.path("compiledAlike");
        int bytes = 0;
        int shape = 0;
        for (JsonNode match : alike.path("asOriginal")) {
            if ("bytes".equals(match.asText())) {
                bytes++;
            } else {
                shape++;
            }
        }
        int groups = alike.path("duplicates").size();
        int repeats = 0;
        for (JsonNode group : alike.path("duplicates")) {
            repeats += group.size() - 1;
        }
        JsonNode timings = results.path("timings");
        double compare = timings.path("compare survivors").asDouble();
        double total = timings.path("total").asDouble();
        System.out.printf(Locale.ROOT, "mutants made                 %6d%n", mutants);
        System.out.printf(Locale.ROOT, "not made (default rules)     %6d  (%s)%n", notMade, reasons.length() == 0 ? "none" : reasons);
        System.out.printf(Locale.ROOT, "survivors                    %6d  (%d compared)%n", survivors, alike.path("compared").asInt());
        System.out.printf(Locale.ROOT, "proposed equivalent          %6d  (%d same bytes, %d same shape only)%n", bytes + shape, bytes, shape);
        System.out.printf(Locale.ROOT, "duplicates                   %6d  (in %d groups; each group's first not counted)%n", repeats, groups);
        System.out.printf(Locale.ROOT, "compare survivors            %6.1f s of %.1f s (%.1f%% of the run)%n",
                compare / 1000, total / 1000, total > 0 ? 100 * compare / total : 0);
    }
}
