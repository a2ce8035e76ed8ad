package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;

/** Reads a written chart back and checks what every chart must be. */
final class Png {

  private Png() {}

  /**
   * Checks that the file exists, is non-empty, is a PNG (its signature, from the PNG specification,
   * ISO/IEC 15948: bytes 89 50 4E 47 0D 0A 1A 0A), has the chart size, and shows more than a blank
   * page (a good share of pixels that are neither white nor near white).
   */
  static BufferedImage check(Path file) throws IOException {
    assertThat(file).exists().isRegularFile();
    byte[] bytes = Files.readAllBytes(file);
    assertThat(bytes.length).as("size of %s", file).isGreaterThan(5_000);
    assertThat(new byte[] {bytes[0], bytes[1], bytes[2], bytes[3]})
        .as("PNG signature")
        .containsExactly((byte) 0x89, (byte) 0x50, (byte) 0x4E, (byte) 0x47);
    BufferedImage image = ImageIO.read(file.toFile());
    assertThat(image).as("readable by ImageIO").isNotNull();
    assertThat(image.getWidth()).isEqualTo(ChartFiles.WIDTH);
    assertThat(image.getHeight()).isEqualTo(ChartFiles.HEIGHT);
    int inked = 0;
    for (int y = 0; y < image.getHeight(); y += 2) {
      for (int x = 0; x < image.getWidth(); x += 2) {
        int rgb = image.getRGB(x, y);
        int r = (rgb >> 16) & 0xff;
        int g = (rgb >> 8) & 0xff;
        int b = rgb & 0xff;
        if (r + g + b < 600) {
          inked++;
        }
      }
    }
    assertThat(inked).as("pixels drawn in %s", file).isGreaterThan(500);
    return image;
  }

  /** Whether some pixel of the image is close to a colour (within 40 per channel). */
  static boolean hasColour(BufferedImage image, java.awt.Color colour) {
    for (int y = 0; y < image.getHeight(); y++) {
      for (int x = 0; x < image.getWidth(); x++) {
        int rgb = image.getRGB(x, y);
        if (Math.abs(((rgb >> 16) & 0xff) - colour.getRed()) < 40
            && Math.abs(((rgb >> 8) & 0xff) - colour.getGreen()) < 40
            && Math.abs((rgb & 0xff) - colour.getBlue()) < 40) {
          return true;
        }
      }
    }
    return false;
  }
}
