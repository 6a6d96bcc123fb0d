package org.fatefield.viz.tissue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;

/**
 * Writes frames as a looping animated GIF with the JDK's own GIF writer (the animation is the
 * standard NETSCAPE2.0 application extension in each frame's metadata).
 */
public final class AnimatedGif {

    private AnimatedGif() {
    }

    /** Writes the PNG frames in {@code files} (read one at a time), each shown for {@code delayMillis}. */
    public static void write(List<Path> files, int delayMillis, OutputStream out) throws IOException {
        List<BufferedImage> none = List.of();
        write(none, files, delayMillis, out);
    }

    private static void write(List<BufferedImage> frames, List<Path> files, int delayMillis,
            OutputStream out) throws IOException {
        int count = frames.isEmpty() ? files.size() : frames.size();
        if (count == 0) {
            throw new IllegalArgumentException("an animation needs at least one frame");
        }
        ImageWriter writer = ImageIO.getImageWritersByFormatName("gif").next();
        try (ImageOutputStream stream = ImageIO.createImageOutputStream(out)) {
            writer.setOutput(stream);
            writer.prepareWriteSequence(null);
            for (int f = 0; f < count; f++) {
                BufferedImage frame = frames.isEmpty() ? ImageIO.read(files.get(f).toFile()) : frames.get(f);
                BufferedImage indexed = new BufferedImage(frame.getWidth(), frame.getHeight(), BufferedImage.TYPE_INT_RGB);
                indexed.getGraphics().drawImage(frame, 0, 0, null);
                ImageTypeSpecifier type = ImageTypeSpecifier.createFromRenderedImage(indexed);
                IIOMetadata metadata = writer.getDefaultImageMetadata(type, null);
                String format = metadata.getNativeMetadataFormatName();
                IIOMetadataNode root = (IIOMetadataNode) metadata.getAsTree(format);
                IIOMetadataNode control = child(root, "GraphicControlExtension");
                control.setAttribute("disposalMethod", "none");
                control.setAttribute("userInputFlag", "FALSE");
                control.setAttribute("transparentColorFlag", "FALSE");
                control.setAttribute("delayTime", Integer.toString(Math.max(1, delayMillis / 10)));
                control.setAttribute("transparentColorIndex", "0");
                IIOMetadataNode extensions = child(root, "ApplicationExtensions");
                IIOMetadataNode loop = new IIOMetadataNode("ApplicationExtension");
                loop.setAttribute("applicationID", "NETSCAPE");
                loop.setAttribute("authenticationCode", "2.0");
                loop.setUserObject(new byte[] {1, 0, 0});
                extensions.appendChild(loop);
                metadata.setFromTree(format, root);
                writer.writeToSequence(new IIOImage(indexed, null, metadata), null);
            }
            writer.endWriteSequence();
        } finally {
            writer.dispose();
        }
    }

    private static IIOMetadataNode child(IIOMetadataNode root, String name) {
        for (int i = 0; i < root.getLength(); i++) {
            if (root.item(i).getNodeName().equalsIgnoreCase(name)) {
                return (IIOMetadataNode) root.item(i);
            }
        }
        IIOMetadataNode node = new IIOMetadataNode(name);
        root.appendChild(node);
        return node;
    }
}
