package org.plateward.cli;

public final class PlatewardCommand {
  public static void main(String[] args) {
    System.out.println("plateward");
  }
}
