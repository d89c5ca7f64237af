package geometry

import (
	"math"
	"testing"

	"github.com/paulmach/orb"
)

// TestAnchorToWGS84 checks the local tangent plane against hand-computed
// values on the WGS 84 ellipsoid (a = 6378137 m, f = 1/298.257223563; from
// memory): at the equator, 1 km north is 1000/M rad with the meridian radius
// M = a(1 − e²) = 6335439.327 m, 0.009043694°, and 1 km east is 1000/a rad,
// 0.008983153° (hand-computed; the tangent plane's own error is below
// 1e-11° at 1 km, derived).
func TestAnchorToWGS84(t *testing.T) {
	deg := math.Pi / 180
	for _, tt := range []struct {
		name     string
		a        Anchor
		p        orb.Point
		lon, lat float64
	}{
		{"datum", Anchor{Latitude: 52 * deg, Longitude: -1.5 * deg, BearingX: 0.3}, orb.Point{}, -1.5, 52},
		{"+X north, 1 km", Anchor{BearingX: 0}, orb.Point{1000, 0}, 0, 0.009043694},
		{"+X east, 1 km", Anchor{BearingX: 90 * deg}, orb.Point{1000, 0}, 0.008983153, 0},
		{"+Y with +X east is north", Anchor{BearingX: 90 * deg}, orb.Point{0, 1000}, 0, 0.009043694},
		{"+Y with +X north is west", Anchor{BearingX: 0}, orb.Point{0, 1000}, -0.008983153, 0},
		{"wrapped at the antimeridian", Anchor{Longitude: 180 * deg, BearingX: 90 * deg}, orb.Point{1000, 0}, -179.991016847, 0},
	} {
		t.Run(tt.name, func(t *testing.T) {
			lon, lat := tt.a.ToWGS84(tt.p)
			if math.Abs(lon-tt.lon) > 5e-9 || math.Abs(lat-tt.lat) > 5e-9 {
				t.Errorf("got (%.9f, %.9f), want (%.9f, %.9f)", lon, lat, tt.lon, tt.lat)
			}
		})
	}
}

// TestPropertyAnchorKeepsDistances: plan distances survive the conversion
// to within 1 mm up to 2 km from the datum at any latitude up to 80°
// (distances on the ellipsoid by the local radii of curvature,
// hand-derived: ds² = (M dφ)² + (N cos φ dλ)² over short steps).
func TestPropertyAnchorKeepsDistances(t *testing.T) {
	deg := math.Pi / 180
	for _, latDeg := range []float64{-80, -33, 0, 45, 60, 80} {
		a := Anchor{Latitude: latDeg * deg, Longitude: 10 * deg, BearingX: 37 * deg}
		prev := orb.Point{}
		plon, plat := a.ToWGS84(prev)
		for k := 1; k <= 200; k++ {
			q := orb.Point{10 * float64(k), 3 * float64(k)}
			lon, lat := a.ToWGS84(q)
			phi := (lat + plat) / 2 * deg
			sp := math.Sin(phi)
			w := math.Sqrt(1 - wgs84E2*sp*sp)
			m, n := wgs84A*(1-wgs84E2)/(w*w*w), wgs84A/w
			ds := math.Hypot(m*(lat-plat)*deg, n*math.Cos(phi)*(lon-plon)*deg)
			if want := math.Hypot(q[0]-prev[0], q[1]-prev[1]); math.Abs(ds-want) > 1e-3 {
				t.Fatalf("latitude %g°, step %d: %.6f m on the ellipsoid, want %.6f", latDeg, k, ds, want)
			}
			prev, plon, plat = q, lon, lat
		}
	}
}

func TestAnchorValidate(t *testing.T) {
	deg := math.Pi / 180
	for _, a := range []Anchor{
		{Latitude: math.NaN()}, {Latitude: 89.5 * deg}, {Longitude: 181 * deg}, {BearingX: math.Inf(1)},
	} {
		if err := a.Validate(); err == nil {
			t.Errorf("%+v: got nil, want an error", a)
		}
	}
	if err := (Anchor{Latitude: 60 * deg, Longitude: -120 * deg, BearingX: 3}).Validate(); err != nil {
		t.Errorf("a good anchor: %v", err)
	}
}

// FuzzAnchorToWGS84: a valid anchor and a plan point within 100 km give a
// finite longitude within ±180° and a latitude within ±90°.
func FuzzAnchorToWGS84(f *testing.F) {
	f.Add(0.0, 0.0, 0.0, 0.0, 0.0)
	f.Add(89.0, 180.0, 359.0, 1e5, -1e5)
	f.Add(-52.5, -179.99, -90.0, 500.0, 30.0)
	f.Fuzz(func(t *testing.T, lat, lon, bearing, x, y float64) {
		deg := math.Pi / 180
		a := Anchor{Latitude: lat * deg, Longitude: lon * deg, BearingX: bearing * deg}
		if a.Validate() != nil || math.Abs(bearing) > 1e6 || !(math.Abs(x) <= 1e5) || !(math.Abs(y) <= 1e5) {
			return
		}
		gl, gt := a.ToWGS84(orb.Point{x, y})
		if !(math.Abs(gl) <= 180) || !(math.Abs(gt) <= 90) {
			t.Fatalf("%+v, (%g, %g): got (%g, %g)", a, x, y, gl, gt)
		}
	})
}
