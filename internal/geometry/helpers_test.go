package geometry

import (
	"math"
	"math/rand/v2"
	"slices"
	"testing"

	"github.com/paulmach/orb"
)

// Shapes used by many tests. Hand-computed distances below refer to them.
var (
	// unitSquare is the square (0,0)–(1,1), counter-clockwise.
	unitSquare = orb.Ring{{0, 0}, {1, 0}, {1, 1}, {0, 1}, {0, 0}}
	// lRoom is an L-shaped room of area 3 m²: the square (0,0)–(2,2) less
	// the quarter (1,1)–(2,2); its reflex corner is (1,1).
	//
	//	(0,2) +---+ (1,2)
	//	      |   |
	//	      |   +---+ (2,1)
	//	      |  (1,1)|
	//	(0,0) +-------+ (2,0)
	lRoom = orb.Ring{{0, 0}, {2, 0}, {2, 1}, {1, 1}, {1, 2}, {0, 2}, {0, 0}}
)

// reversed returns a reversed copy of r.
func reversed(r orb.Ring) orb.Ring {
	out := slices.Clone(r)
	slices.Reverse(out)
	return out
}

// box returns the closed counter-clockwise rectangle (x0,y0)–(x1,y1).
func box(x0, y0, x1, y1 float64) orb.Ring {
	return orb.Ring{{x0, y0}, {x1, y0}, {x1, y1}, {x0, y1}, {x0, y0}}
}

// near reports whether got is within tol of want (both infinite of the same
// sign, or both NaN, also count).
func near(got, want, tol float64) bool {
	if math.IsNaN(want) {
		return math.IsNaN(got)
	}
	if math.IsInf(want, 0) {
		return got == want
	}
	return math.Abs(got-want) <= tol
}

// starRing returns a random simple polygon with k vertices around centre c:
// vertex angles strictly increasing, radii in [rmin, rmax]. With rmin ==
// rmax it is convex; otherwise usually not. Counter-clockwise and closed.
func starRing(rng *rand.Rand, c orb.Point, k int, rmin, rmax float64) orb.Ring {
	angles := make([]float64, k)
	for i := range angles {
		// Spread the angles over k equal sectors so no two coincide.
		angles[i] = (float64(i) + 0.1 + 0.8*rng.Float64()) * 2 * math.Pi / float64(k)
	}
	r := make(orb.Ring, 0, k+1)
	for _, a := range angles {
		rad := rmin + (rmax-rmin)*rng.Float64()
		r = append(r, orb.Point{c[0] + rad*math.Cos(a), c[1] + rad*math.Sin(a)})
	}
	return append(r, r[0])
}

// windingInside is an independent inside test for points off the boundary:
// the winding number of r about p is non-zero.
func windingInside(r orb.Ring, p orb.Point) bool {
	w := 0
	for i := 0; i+1 < len(r); i++ {
		a, b := r[i], r[i+1]
		isLeft := (b[0]-a[0])*(p[1]-a[1]) - (p[0]-a[0])*(b[1]-a[1])
		if a[1] <= p[1] {
			if b[1] > p[1] && isLeft > 0 {
				w++
			}
		} else if b[1] <= p[1] && isLeft < 0 {
			w--
		}
	}
	return w != 0
}

// mustPanic fails the test unless f panics.
func mustPanic(t *testing.T, name string, f func()) {
	t.Helper()
	defer func() {
		if recover() == nil {
			t.Errorf("%s: got no panic, want one", name)
		}
	}()
	f()
}
