package dev.changeling.project;

import java.nio.file.Path;
import java.util.List;

/** Turns Maven coordinates ({@code group:artifact:version}) into the jars of them and of everything they need. */
interface ArtifactResolver {

    List<Path> resolve(List<String> coordinates);
}
