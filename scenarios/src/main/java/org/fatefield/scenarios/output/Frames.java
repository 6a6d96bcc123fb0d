package org.fatefield.scenarios.output;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.viz.tissue.AnimatedGif;
import org.fatefield.viz.tissue.TissueRenderer;

/**
 * PNG frames of a running tissue in {@code frames/frame-<step>.png} (headless, for clusters), and
 * at the end {@code tissue.gif}, a looping animation of them. To make a video instead:
 * {@code ffmpeg -framerate 10 -pattern_type glob -i 'frames/*.png' -pix_fmt yuv420p tissue.mp4}.
 */
final class Frames {

    private final Path folder;
    private final String title;

    Frames(Path runFolder, String title) {
        this.folder = runFolder.resolve(RunLayout.FRAMES);
        this.title = title;
    }

    /** Writes the tissue's current frame (atomically). */
    void write(Tissue tissue) throws IOException {
        Files.createDirectories(folder);
        Path target = folder.resolve(String.format(Locale.ROOT, "frame-%08d.png", tissue.steps()));
        Path temporary = RunLayout.partial(target);
        String caption = String.format(Locale.ROOT, "%s at t = %.1f h (%d cells)", title, tissue.time(),
                tissue.cells().size());
        ImageIO.write(TissueRenderer.render(tissue, caption, 640), "png", temporary.toFile());
        Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }

    /** Writes the animation of every frame so far; returns the names it adds to the run folder. */
    List<String> finish(RunFolder run) throws IOException {
        List<Path> files;
        try (Stream<Path> list = Files.list(folder)) {
            files = list.filter(p -> p.getFileName().toString().matches("frame-\\d+\\.png")).sorted().toList();
        }
        run.write(RunLayout.ANIMATION, out -> AnimatedGif.write(files, 150, out));
        return List.of(RunLayout.FRAMES + "/", RunLayout.ANIMATION);
    }
}
