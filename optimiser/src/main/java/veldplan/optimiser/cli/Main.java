package veldplan.optimiser.cli;

public final class Main {
  public static void main(String[] args) {}
}
