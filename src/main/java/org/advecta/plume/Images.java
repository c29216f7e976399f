package org.advecta.plume;

/**
 * The image sources of at most one wall across y and one across z: image i mirrors y when
 * bit 0 of i is set and z when bit 1 is set, with the product of the walls' signs. Immutable.
 */
final class Images {

    static final Images NONE = new Images(null, 0, null, 0);

    final Wall wallY;
    final int sideY;
    final Wall wallZ;
    final int sideZ;

    Images(Wall wallY, int sideY, Wall wallZ, int sideZ) {
        this.wallY = wallY;
        this.sideY = sideY;
        this.wallZ = wallZ;
        this.sideZ = sideZ;
    }

    /**
     * Returns these images with one more wall, checking that the source's extent lies on one
     * side of it.
     */
    Images with(Wall wall, double lo, double hi, boolean allowZ) {
        if (wall == null) {
            throw new IllegalArgumentException("wall: must not be null");
        }
        if (wall.axis() == Wall.Axis.Y) {
            if (wallY != null) {
                throw new IllegalArgumentException("a wall across y is already set: " + wallY);
            }
            return new Images(wall, wall.sideOf(lo, hi, "source extent in y"), wallZ, sideZ);
        }
        if (!allowZ) {
            throw new IllegalArgumentException("wall: a two-dimensional source has no z axis");
        }
        if (wallZ != null) {
            throw new IllegalArgumentException("a wall across z is already set: " + wallZ);
        }
        return new Images(wallY, sideY, wall, wall.sideOf(lo, hi, "source extent in z"));
    }

    /** Number of terms (1, 2 or 4). */
    int count() {
        return (wallY == null ? 1 : 2) * (wallZ == null ? 1 : 2);
    }

    /** Whether any wall is absorbing. */
    boolean absorbing() {
        return (wallY != null && wallY.isAbsorbing()) || (wallZ != null && wallZ.isAbsorbing());
    }

    /** Index into the 2-bit image code for term i. */
    private int code(int i) {
        return wallY == null ? i << 1 : i;
    }

    double y(int i, double y) {
        return (code(i) & 1) != 0 ? wallY.mirror(y) : y;
    }

    double z(int i, double z) {
        return (code(i) & 2) != 0 ? wallZ.mirror(z) : z;
    }

    double sign(int i) {
        final int c = code(i);
        return ((c & 1) != 0 ? wallY.sign() : 1.0) * ((c & 2) != 0 ? wallZ.sign() : 1.0);
    }

    void checkPoint(double y, double z) {
        if (wallY != null) {
            wallY.checkSide(sideY, "y", y);
        }
        if (wallZ != null) {
            wallZ.checkSide(sideZ, "z", z);
        }
    }
}
