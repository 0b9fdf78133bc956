package org.plateward.reactor;

/**
 * Everything the model needs about one reactor unit, SI throughout.
 *
 * @param name unit name (invented for the demo)
 * @param site site name
 * @param geometry plate stack geometry
 * @param plate structural alloy
 * @param buffer buffer-layer metal
 * @param catalyst washcoats
 * @param heatLoss heat loss
 * @param feedGas dry reforming feed composition
 * @param operatingPoint normal operating point (the inputs)
 * @param grid model grid for the estimator
 */
public record UnitSpec(
    String name,
    String site,
    Geometry geometry,
    PlateMaterial plate,
    BufferMaterial buffer,
    CatalystSpec catalyst,
    HeatLossSpec heatLoss,
    FeedGas feedGas,
    OperatingPoint operatingPoint,
    GridSpec grid) {
  public UnitSpec withGrid(GridSpec g) {
    return new UnitSpec(name, site, geometry, plate, buffer, catalyst, heatLoss, feedGas, operatingPoint, g);
  }
}
