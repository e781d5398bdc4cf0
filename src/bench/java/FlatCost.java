import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.changeling.mutant.Generation;
import dev.changeling.mutant.MutantRequest;
import dev.changeling.operator.Operators;
import dev.changeling.source.SourceFile;
import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * The two halves of src/bench/flat-cost.sh.
 *
 * <pre>
 * java -cp target/changeling.jar:target/bench/classes FlatCost project DIR MUTANTS
 * java -cp target/changeling.jar:target/bench/classes FlatCost figures RESULTS_JSON
 * </pre>
 *
 * {@code project} writes a Maven project of seed lots (a made-up seed catalogue) to DIR: every lot is one main class
 * of the same shape with its own constants and one test class, so every lot makes the same number of mutants with the
 * default operators. That number is counted here with the tool's own generation, and as many lots are written as come
 * closest to MUTANTS; the line printed is "LOTS MUTANTS_PER_LOT". Each test calls one method with constant arguments,
 * so every mutant runs one cheap test: the time per mutant is then mostly the engine's own. Some tests check
 * boundaries and exact values (their mutants are killed), others only a value in the middle or a loose bound (some of
 * their mutants survive).
 *
 * {@code figures} prints one line from a results file: "MUTANTS KILLED SURVIVED OTHER" and then the milliseconds of
 * the phases "MAVEN GENERATE COMPILE BASELINE EXECUTE COMPARE TOTAL" (-1 for a phase the file does not have).
 */
public final class FlatCost {

    private static final String PACKAGE = "dev.changeling.bench.seeds";

    private FlatCost() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length == 3 && args[0].equals("project")) {
            project(Path.of(args[1]), Integer.parseInt(args[2]));
        } else if (args.length == 2 && args[0].equals("figures")) {
            figures(new File(args[1]));
        } else {
            System.err.println("usage: FlatCost project DIR MUTANTS | FlatCost figures RESULTS_JSON");
            System.exit(2);
        }
    }

    /** The constants that make one lot differ from the next; the shape of the code stays the same. */
    private record Lot(int number, int sowFrom, int sowTo, int centsPerGram, int germinationPercent) {

        static Lot of(int number) {
            int sowFrom = 2 + number % 5;
            return new Lot(number, sowFrom, sowFrom + 2 + number % 3, 3 + number % 7, 60 + number % 35);
        }

        String name() {
            return String.format(Locale.ROOT, "SeedLot%05d", number);
        }

        // What the lot's methods compute, mirrored here so the tests can state exact values.
        int seedlings(int sown) {
            return sown <= 0 ? 0 : sown * germinationPercent / 100;
        }

        int packetCents(int grams, boolean organic) {
            int cents = grams * centsPerGram;
            if (organic) {
                cents += cents / 4;
            }
            if (grams > 50) {
                cents -= grams - 50;
            }
            return cents;
        }

        int depthMillis(int seedMillis, boolean surfaceSown) {
            return surfaceSown || seedMillis < 1 ? 0 : seedMillis * 2 + 1;
        }
    }

    private static void project(Path dir, int wanted) throws IOException {
        if (wanted < 1) {
            throw new IllegalArgumentException("MUTANTS must be at least 1, not " + wanted);
        }
        Lot first = Lot.of(1);
        String path = "src/main/java/" + PACKAGE.replace('.', '/') + "/" + first.name() + ".java";
        int perLot = Generation.generate(List.of(SourceFile.of(path, mainClass(first))),
                MutantRequest.firstOrder(Operators.defaults())).mutants().size();
        int lots = Math.max(1, Math.round((float) wanted / perLot));

        Path main = dir.resolve("src/main/java").resolve(PACKAGE.replace('.', '/'));
        Path test = dir.resolve("src/test/java").resolve(PACKAGE.replace('.', '/'));
        Files.createDirectories(main);
        Files.createDirectories(test);
        write(dir.resolve("pom.xml"), POM);
        for (int number = 1; number <= lots; number++) {
            Lot lot = Lot.of(number);
            write(main.resolve(lot.name() + ".java"), mainClass(lot));
            write(test.resolve(lot.name() + "Test.java"), testClass(lot));
        }
        System.out.println(lots + " " + perLot);
    }

    private static void write(Path file, String text) throws IOException {
        Files.writeString(file, text, StandardCharsets.UTF_8);
    }

    private static String mainClass(Lot lot) {
        return """
                package %1$s;

                /** Lot %2$d of the seed catalogue: when it may be sown, how it comes up, what a packet costs. */
                public final class %3$s {

                    private static final int SOW_FROM_MONTH = %4$d;
                    private static final int SOW_TO_MONTH = %5$d;
                    private static final int CENTS_PER_GRAM = %6$d;
                    private static final int GERMINATION_PERCENT = %7$d;

                    public int seedlings(int sown) {
                        if (sown <= 0) {
                            return 0;
                        }
                        return sown * GERMINATION_PERCENT / 100;
                    }

                    public boolean sowable(int month) {
                        return month >= SOW_FROM_MONTH && month <= SOW_TO_MONTH;
                    }

                    public int packetCents(int grams, boolean organic) {
                        int cents = grams * CENTS_PER_GRAM;
                        if (organic) {
                            cents += cents / 4;
                        }
                        if (grams > 50) {
                            cents -= grams - 50;
                        }
                        return cents;
                    }

                    public int depthMillis(int seedMillis, boolean surfaceSown) {
                        if (surfaceSown || seedMillis < 1) {
                            return 0;
                        }
                        return seedMillis * 2 + 1;
                    }

                    public int totalGrams(int[] packets) {
                        int total = 0;
                        for (int grams : packets) {
                            total += grams;
                        }
                        return total;
                    }

                    public boolean needsChilling(int dormantWeeks, boolean hardy) {
                        return !hardy && dormantWeeks > 2 || dormantWeeks > 8;
                    }

                    public int shelfYears(int storedCelsius) {
                        int years = 5 - storedCelsius / 10;
                        return years < 1 ? 1 : years;
                    }
                }
                """.formatted(PACKAGE, lot.number(), lot.name(), lot.sowFrom(), lot.sowTo(), lot.centsPerGram(),
                lot.germinationPercent());
    }

    private static String testClass(Lot lot) {
        return """
                package %1$s;

                import static org.junit.jupiter.api.Assertions.assertEquals;
                import static org.junit.jupiter.api.Assertions.assertFalse;
                import static org.junit.jupiter.api.Assertions.assertTrue;

                import org.junit.jupiter.api.Test;

                class %2$sTest {

                    private final %2$s lot = new %2$s();

                    @Test
                    void seedlingsOfASowing() {
                        assertEquals(%3$d, lot.seedlings(200));
                        assertEquals(0, lot.seedlings(0));
                    }

                    @Test
                    void sowableInTheMiddleOfItsSeason() {
                        assertTrue(lot.sowable(%4$d));
                        assertFalse(lot.sowable(12));
                    }

                    @Test
                    void packetPrices() {
                        assertEquals(%5$d, lot.packetCents(10, false));
                        assertEquals(%6$d, lot.packetCents(80, true));
                    }

                    @Test
                    void sowingDepth() {
                        assertEquals(%7$d, lot.depthMillis(3, false));
                        assertEquals(0, lot.depthMillis(3, true));
                        assertEquals(0, lot.depthMillis(0, false));
                    }

                    @Test
                    void gramsOfAnOrder() {
                        assertEquals(17, lot.totalGrams(new int[] {5, 12}));
                    }

                    @Test
                    void tenderSeedsNeedChilling() {
                        assertTrue(lot.needsChilling(4, false));
                    }

                    @Test
                    void keepsAtLeastAYear() {
                        assertTrue(lot.shelfYears(4) >= 1);
                    }
                }
                """.formatted(PACKAGE, lot.name(), lot.seedlings(200), lot.sowFrom() + 1, lot.packetCents(10, false),
                lot.packetCents(80, true), lot.depthMillis(3, false));
    }

    private static void figures(File results) throws IOException {
        JsonNode root = new ObjectMapper().readTree(results);
        Map<String, Integer> verdicts = new TreeMap<>();
        for (JsonNode mutant : root.get("mutants")) {
            verdicts.merge(mutant.path("verdict").asText(), 1, Integer::sum);
        }
        int mutants = root.get("mutants").size();
        int killed = verdicts.getOrDefault("killed", 0);
        int survived = verdicts.getOrDefault("survived", 0);
        StringBuilder line = new StringBuilder();
        line.append(mutants).append(' ').append(killed).append(' ').append(survived).append(' ')
                .append(mutants - killed - survived);
        JsonNode timings = root.get("timings");
        for (String phase : List.of("maven", "generate", "compile", "baseline", "execute", "compare survivors", "total")) {
            line.append(' ').append(timings.path(phase).asLong(-1));
        }
        System.out.println(line);
    }

    private static final String POM = """
            <?xml version="1.0" encoding="UTF-8"?>
            <project xmlns="http://maven.apache.org/POM/4.0.0"
                     xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance"
                     xsi:schemaLocation="http://maven.apache.org/POM/4.0.0 https://maven.apache.org/xsd/maven-4.0.0.xsd">
              <modelVersion>4.0.0</modelVersion>

              <groupId>dev.changeling.bench</groupId>
              <artifactId>seed-catalogue</artifactId>
              <version>1.0.0</version>
              <name>Seed catalogue (generated by src/bench/flat-cost.sh)</name>

              <properties>
                <maven.compiler.release>17</maven.compiler.release>
                <project.build.sourceEncoding>UTF-8</project.build.sourceEncoding>
              </properties>

              <dependencyManagement>
                <dependencies>
                  <dependency>
                    <groupId>org.junit</groupId>
                    <artifactId>junit-bom</artifactId>
                    <version>6.1.3</version>
                    <type>pom</type>
                    <scope>import</scope>
                  </dependency>
                </dependencies>
              </dependencyManagement>

              <dependencies>
                <dependency>
                  <groupId>org.junit.jupiter</groupId>
                  <artifactId>junit-jupiter</artifactId>
                  <scope>test</scope>
                </dependency>
              </dependencies>

              <build>
                <plugins>
                  <plugin>
                    <groupId>org.apache.maven.plugins</groupId>
                    <artifactId>maven-compiler-plugin</artifactId>
                    <version>3.13.0</version>
                  </plugin>
                  <plugin>
                    <groupId>org.apache.maven.plugins</groupId>
                    <artifactId>maven-surefire-plugin</artifactId>
                    <version>3.5.4</version>
                  </plugin>
                </plugins>
              </build>
            </project>
            """;
}
