package dev.changeling.build;

import dev.changeling.mutant.Point;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

public final class DebugDump {
    public static void main(String[] args) throws Exception {
        TestProject project = SchemaBuildBenchmark.greenhouse(Files.createTempDirectory("dbg"));
        for (String name : SchemaBuildBenchmark.GREENHOUSE) {
            List<Point> points = project.points("greenhouse/" + name, SampleOperators.all());
            Map<Point, Integer> ids = new HashMap<>();
            points.stream().sorted(SchemaCompiler.ID_ORDER).forEach(p -> ids.put(p, ids.size()));
            RenderedFile r = SchemaRenderer.render(project.file("greenhouse/" + name), points, ids);
            Files.createDirectories(Path.of("/tmp/dbg/greenhouse"));
            Files.writeString(Path.of("/tmp/dbg/greenhouse/" + name), r.text());
        }
        System.out.println(project.probe);
    }
}
