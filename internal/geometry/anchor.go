package geometry

import (
	"errors"
	"fmt"
	"math"

	"github.com/paulmach/orb"
)

// WGS 84 ellipsoid (NIMA TR8350.2, 3rd ed., table 3.1; from memory, and
// the defining constants of the GPS system).
const (
	wgs84A = 6378137.0         // semi-major axis, m
	wgs84F = 1 / 298.257223563 // flattening
)

// wgs84E2 is the first eccentricity squared, e² = f(2 − f).
const wgs84E2 = wgs84F * (2 - wgs84F)

// MaxAnchorLatitude is the largest latitude magnitude, rad, an [Anchor] may
// have (89°): nearer a pole the bearing of +X is ill defined.
const MaxAnchorLatitude = 89 * math.Pi / 180

// Anchor ties the cell frame to the Earth: the datum's place on the WGS 84
// ellipsoid and the direction of the cell's +X axis.
type Anchor struct {
	Latitude  float64 // of the datum, WGS 84, rad, north positive
	Longitude float64 // of the datum, WGS 84, rad, east positive
	// BearingX is the true bearing of the cell's +X axis, rad, clockwise
	// from true north (π/2 when +X points east). A grid bearing from a map
	// projection differs from it by the grid convergence.
	BearingX float64
}

// ErrAnchor is wrapped by every error about an unusable anchor.
var ErrAnchor = errors.New("geometry: bad anchor")

// Validate reports an anchor with a non-finite value, a latitude beyond
// [MaxAnchorLatitude] or a longitude outside ±180°.
func (a Anchor) Validate() error {
	switch {
	case !finite(a.Latitude) || !finite(a.Longitude) || !finite(a.BearingX):
		return fmt.Errorf("%w: latitude, longitude and bearing must be finite", ErrAnchor)
	case math.Abs(a.Latitude) > MaxAnchorLatitude:
		return fmt.Errorf("%w: latitude %.6g° is within 1° of a pole", ErrAnchor, a.Latitude*180/math.Pi)
	case math.Abs(a.Longitude) > math.Pi:
		return fmt.Errorf("%w: longitude %.6g° is outside ±180°", ErrAnchor, a.Longitude*180/math.Pi)
	}
	return nil
}

// ToWGS84 returns the WGS 84 longitude and latitude, degrees, of the plan
// point p (cell frame, m, on the floor), in that order as GeoJSON wants.
//
// The cell's floor is taken as the plane tangent to the ellipsoid at the
// datum (a local tangent plane, east-north-up): p is turned into east and
// north by the bearing of +X, placed in that plane, and carried along the
// ellipsoid's normal to its surface (exact conversion through Earth-centred
// coordinates). Distances in plan are kept to within d³/(3R²) at a distance
// d from the datum (R ≈ 6.4e6 m), under 0.01 mm within 1 km (derived): exact
// enough for a test pad or a site. The longitude is wrapped into ±180°.
func (a Anchor) ToWGS84(p orb.Point) (lon, lat float64) {
	s, c := math.Sincos(a.BearingX)
	// +X is (sin β, cos β) in (east, north); +Y is +X turned 90° anticlockwise
	e := p[0]*s - p[1]*c
	n := p[0]*c + p[1]*s
	sp, cp := math.Sincos(a.Latitude)
	sl, cl := math.Sincos(a.Longitude)
	nu := wgs84A / math.Sqrt(1-wgs84E2*sp*sp)
	x := nu*cp*cl - sl*e - sp*cl*n
	y := nu*cp*sl + cl*e - sp*sl*n
	z := nu*(1-wgs84E2)*sp + cp*n
	lonR := math.Atan2(y, x)
	// geodetic latitude by fixed-point iteration (converges to machine
	// precision in a few steps away from the poles)
	r := math.Hypot(x, y)
	phi := math.Atan2(z, r*(1-wgs84E2))
	for range 6 {
		sphi := math.Sin(phi)
		nuPhi := wgs84A / math.Sqrt(1-wgs84E2*sphi*sphi)
		h := r/math.Cos(phi) - nuPhi
		phi = math.Atan2(z, r*(1-wgs84E2*nuPhi/(nuPhi+h)))
	}
	return math.Remainder(lonR*180/math.Pi, 360), phi * 180 / math.Pi
}
