package org.plateward.plot;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import javax.imageio.ImageIO;

/** Pixel statistics of a PNG for "not blank" checks. */
public final class PixelStats {
  private PixelStats() {}

  public static BufferedImage read(Path file) throws IOException {
    BufferedImage img = ImageIO.read(file.toFile());
    if (img == null) {
      throw new IOException(file + " is not a readable image");
    }
    return img;
  }

  /** Variance of the grey level (0..255) over all pixels: 0 for a blank image. */
  public static double greyVariance(BufferedImage img) {
    double sum = 0.0;
    double sq = 0.0;
    long n = 0;
    for (int y = 0; y < img.getHeight(); y++) {
      for (int x = 0; x < img.getWidth(); x++) {
        int rgb = img.getRGB(x, y);
        double grey = 0.299 * ((rgb >> 16) & 0xFF) + 0.587 * ((rgb >> 8) & 0xFF) + 0.114 * (rgb & 0xFF);
        sum += grey;
        sq += grey * grey;
        n++;
      }
    }
    double mean = sum / n;
    return sq / n - mean * mean;
  }

  /** Number of distinct colours (capped), to tell drawn data from a uniform fill. */
  public static int colours(BufferedImage img, int cap) {
    java.util.Set<Integer> s = new java.util.HashSet<>();
    for (int y = 0; y < img.getHeight() && s.size() < cap; y++) {
      for (int x = 0; x < img.getWidth() && s.size() < cap; x++) {
        s.add(img.getRGB(x, y));
      }
    }
    return s.size();
  }
}
