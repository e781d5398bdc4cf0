package dev.changeling.review.export;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.changeling.analysis.WhySurvived;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.RunResults;
import dev.changeling.review.SameClasses;
import dev.changeling.review.Standing;
import dev.changeling.review.TestNames;
import java.net.URI;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.TreeSet;
import java.util.stream.Collectors;

/**
 * The unresolved survivors as a SARIF 2.1.0 log (OASIS): one rule per mutation operator, one result
 * per survivor, located by project-relative URIs under {@code %SRCROOT%}, columns in UTF-16 units.
 */
public final class SarifReport {

    public static final String SCHEMA = "https://docs.oasis-open.org/sarif/sarif/v2.1.0/os/schemas/sarif-schema-2.1.0.json";
    /** The base the artifact URIs are relative to: the project folder. */
    public static final String SOURCE_ROOT = "%SRCROOT%";
    /** The key of a result's fingerprint among its partial fingerprints. */
    public static final String FINGERPRINT_KEY = "mutantFingerprint/v1";

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private SarifReport() {
    }

    /**
     * The log of a run as it stands: a result per survivor to look at, and a notification per file the run could
     * not read ({@code invocations[0].toolExecutionNotifications}, level {@code error}).
     *
     * @param toolVersion this tool's version, for {@code tool.driver.version}
     */
    public static String render(Standing standing, String toolVersion) {
        RunResults results = standing.results();
        List<MutantResult> survivors = standing.toLookAt();
        List<String> rules = ruleIds(results, survivors);

        ObjectNode log = JSON.createObjectNode();
        log.put("$schema", SCHEMA);
        log.put("version", "2.1.0");
        ObjectNode run = log.putArray("runs").addObject();
        ObjectNode driver = run.putObject("tool").putObject("driver");
        driver.put("name", "changeling");
        driver.put("version", toolVersion);
        ArrayNode ruleArray = driver.putArray("rules");
        for (String rule : rules) {
            ObjectNode descriptor = ruleArray.addObject();
            descriptor.put("id", rule);
            descriptor.putObject("shortDescription")
                    .put("text", "A mutant made by the mutation operator " + rule + " survived: no test failed with it.");
        }
        ObjectNode invocation = run.putArray("invocations").addObject().put("executionSuccessful", results.complete());
        if (!standing.unreadFiles().isEmpty()) {
            ArrayNode notifications = invocation.putArray("toolExecutionNotifications");
            standing.unreadFiles().forEach(problem -> notifications.addObject().put("level", "error")
                    .putObject("message").put("text", "not in the score, the file could not be read: " + problem));
        }
        projectUri(results).ifPresent(uri -> run.putObject("originalUriBaseIds").putObject(SOURCE_ROOT).put("uri", uri));
        run.put("columnKind", "utf16CodeUnits");
        ArrayNode resultArray = run.putArray("results");
        SameClasses sameClasses = SameClasses.of(results);
        TestNames names = new TestNames(results.tests());
        for (MutantResult survivor : survivors) {
            ObjectNode result = resultArray.addObject();
            addResult(result, survivor, rules);
            addProperties(result, survivor, sameClasses, names);
        }
        try {
            return JSON.writeValueAsString(log) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of plain JSON nodes always serialises", e);
        }
    }

    /** "Mutant 1a2b3c4d survived: replaced &lt; with &lt;= in total(int)", every point of a k-order mutant named. */
    static String message(MutantResult survivor) {
        String changes = survivor.points().stream()
                .map(point -> point.description() + " in " + point.member())
                .collect(Collectors.joining("; "));
        String reached = survivor.reachedBy() == null || survivor.reachedBy().isEmpty() ? ""
                : " (" + survivor.reachedBy().size() + (survivor.reachedBy().size() == 1 ? " test reaches" : " tests reach")
                + " it and passed)";
        return "Mutant " + survivor.shortId() + (survivor.order() > 1 ? " of order " + survivor.order() : "")
                + " survived: " + changes + reached;
    }

    /**
     * What is known beyond the verdict, in the result's property bag (SARIF 2.1.0 §3.8): why it survived, the reason it
     * is proposed as equivalent, or the id of the survivor with its very classes that stands for it.
     */
    private static void addProperties(ObjectNode result, MutantResult survivor, SameClasses sameClasses, TestNames names) {
        ObjectNode properties = JSON.createObjectNode();
        WhySurvived.of(survivor).ifPresent(why -> properties.put("whySurvived", why.kind().words())
                .put("whySurvivedInWords", why.sentence(names::of)));
        sameClasses.proposedReason(survivor).ifPresent(reason -> properties.put("proposedEquivalent", reason));
        sameClasses.standingFor(survivor).ifPresent(first -> properties.put("sameClassesAs", first));
        if (!properties.isEmpty()) {
            result.set("properties", properties);
        }
    }

    private static void addResult(ObjectNode result, MutantResult survivor, List<String> rules) {
        String rule = survivor.first().operator();
        result.put("ruleId", rule);
        result.put("ruleIndex", rules.indexOf(rule));
        result.put("level", "warning");
        result.putObject("message").put("text", message(survivor));
        ArrayNode locations = result.putArray("locations");
        for (PointRecord point : survivor.points()) {
            ObjectNode physical = locations.addObject().putObject("physicalLocation");
            physical.putObject("artifactLocation").put("uri", relativeUri(survivor.file())).put("uriBaseId", SOURCE_ROOT);
            ObjectNode region = physical.putObject("region");
            region.put("startLine", point.line());
            region.put("startColumn", point.column());
            region.put("endLine", point.endLine());
            // JavaParser's end column is inclusive; SARIF's is one past the last character (§3.30.8).
            region.put("endColumn", point.endColumn() + 1);
            if (point.original() != null) {
                region.putObject("snippet").put("text", point.original());
            }
        }
        result.putObject("partialFingerprints").put(FINGERPRINT_KEY, survivor.id());
    }

    private static List<String> ruleIds(RunResults results, List<MutantResult> survivors) {
        TreeSet<String> ids = new TreeSet<>();
        if (results.settings() != null && results.settings().operators() != null) {
            ids.addAll(results.settings().operators());
        }
        survivors.forEach(survivor -> ids.add(survivor.first().operator()));
        return new ArrayList<>(ids);
    }

    static String relativeUri(String path) {
        String slashed = path.replace('\\', '/');
        int colon = slashed.indexOf(':');
        int slash = slashed.indexOf('/');
        // A colon in the first segment would read as a URI scheme.
        String safe = colon >= 0 && (slash < 0 || colon < slash) ? "./" + slashed : slashed;
        try {
            return new URI(null, null, safe, null).toASCIIString();
        } catch (URISyntaxException e) {
            throw new IllegalArgumentException("not a path: " + path, e);
        }
    }

    private static Optional<String> projectUri(RunResults results) {
        if (results.settings() == null || results.settings().project() == null || results.settings().project().isEmpty()) {
            return Optional.empty();
        }
        String uri = Path.of(results.settings().project()).toAbsolutePath().toUri().toASCIIString();
        return Optional.of(uri.endsWith("/") ? uri : uri + "/");
    }
}
