package geometry

import (
	"math"
	"math/rand/v2"
	"testing"

	"github.com/paulmach/orb"
)

// randomShapes returns a fixed-seed mix of convex and non-convex random
// polygons (star-shaped, so simple by construction) and discs.
func randomShapes(rng *rand.Rand, n int) []orb.Ring {
	out := make([]orb.Ring, 0, n)
	for i := range n {
		c := orb.Point{-20 + 40*rng.Float64(), -20 + 40*rng.Float64()}
		k := 3 + rng.IntN(14)
		if i%2 == 0 {
			out = append(out, starRing(rng, c, k, 2, 2)) // convex
		} else {
			out = append(out, starRing(rng, c, k, 0.3, 3)) // usually not convex
		}
	}
	return out
}

func TestPropertyContainsMatchesDistanceSign(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 2))
	for si, ring := range randomShapes(rng, 60) {
		ccw := Polygon(ring)
		cw := Footprint{Ring: reversed(ring)} // raw, clockwise, not normalised
		b := ccw.Bound().Pad(1)
		for range 400 {
			p := orb.Point{
				b.Min[0] + (b.Max[0]-b.Min[0])*rng.Float64(),
				b.Min[1] + (b.Max[1]-b.Min[1])*rng.Float64(),
			}
			in, d := ccw.Contains(p), ccw.Distance(p)
			if in != (d <= 0) {
				t.Fatalf("shape %d, point %v: got Contains %v and Distance %g, want Contains == (Distance <= 0)", si, p, in, d)
			}
			// Off the boundary, agree with an independent winding-number test.
			if math.Abs(d) > 1e-9 && in != windingInside(ring, p) {
				t.Fatalf("shape %d, point %v: got Contains %v, want winding-number answer %v", si, p, in, !in)
			}
			// Reversing the ring's orientation changes nothing.
			if got := cw.Contains(p); got != in {
				t.Fatalf("shape %d, point %v, reversed ring: got Contains %v, want %v", si, p, got, in)
			}
			if got := cw.Distance(p); !near(got, d, 1e-12) {
				t.Fatalf("shape %d, point %v, reversed ring: got Distance %.15g, want %.15g", si, p, got, d)
			}
		}
		// Every vertex and every edge midpoint is on the boundary.
		for i := 0; i+1 < len(ring); i++ {
			for _, p := range []orb.Point{ring[i], {(ring[i][0] + ring[i+1][0]) / 2, (ring[i][1] + ring[i+1][1]) / 2}} {
				if !ccw.Contains(p) || ccw.Distance(p) != 0 {
					t.Fatalf("shape %d, boundary point %v: got Contains %v Distance %g, want true and 0", si, p, ccw.Contains(p), ccw.Distance(p))
				}
			}
		}
	}
}

func TestPropertyCircleContainsMatchesDistanceSign(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 4))
	for range 50 {
		c := Circle(orb.Point{-10 + 20*rng.Float64(), -10 + 20*rng.Float64()}, 3*rng.Float64())
		b := c.Bound().Pad(1)
		for range 200 {
			p := orb.Point{b.Min[0] + (b.Max[0]-b.Min[0])*rng.Float64(), b.Min[1] + (b.Max[1]-b.Min[1])*rng.Float64()}
			in, d := c.Contains(p), c.Distance(p)
			if in != (d <= 0) {
				t.Fatalf("circle %v r %g, point %v: got Contains %v and Distance %g, want Contains == (Distance <= 0)", c.Center, c.Radius, p, in, d)
			}
			if want := math.Hypot(p[0]-c.Center[0], p[1]-c.Center[1]) - c.Radius; !near(d, want, 1e-9) {
				t.Fatalf("circle %v r %g, point %v: got Distance %g, want %g", c.Center, c.Radius, p, d, want)
			}
		}
	}
}

func TestPropertySegmentDistanceBrute(t *testing.T) {
	// SegmentDistance is the minimum over the segment of max(0, Distance):
	// check it against dense sampling of the segment (the sampled minimum can
	// only be larger, by at most half the sample spacing).
	rng := rand.New(rand.NewPCG(5, 6))
	shapes := randomShapes(rng, 20)
	for si, ring := range shapes {
		f := Polygon(ring)
		for range 25 {
			a := orb.Point{-25 + 50*rng.Float64(), -25 + 50*rng.Float64()}
			b := orb.Point{a[0] - 8 + 16*rng.Float64(), a[1] - 8 + 16*rng.Float64()}
			got := f.SegmentDistance(a, b)
			const steps = 1000
			sampled := math.Inf(1)
			for k := 0; k <= steps; k++ {
				s := float64(k) / steps
				p := orb.Point{a[0] + s*(b[0]-a[0]), a[1] + s*(b[1]-a[1])}
				sampled = math.Min(sampled, math.Max(0, f.Distance(p)))
			}
			slack := math.Hypot(b[0]-a[0], b[1]-a[1]) / steps
			if got < 0 || got > sampled+1e-12 || got < sampled-slack {
				t.Fatalf("shape %d, segment %v-%v: got %g, want within [%g, %g]", si, a, b, got, sampled-slack, sampled)
			}
		}
	}
}

func TestPropertyRandomRingsPassCheckRing(t *testing.T) {
	rng := rand.New(rand.NewPCG(8, 9))
	for i, ring := range randomShapes(rng, 200) {
		if err := CheckRing(ring); err != nil {
			t.Fatalf("ring %d %v: got %v, want nil", i, ring, err)
		}
		if err := CheckRing(reversed(ring)); err != nil {
			t.Fatalf("ring %d reversed: got %v, want nil", i, err)
		}
	}
}

func TestPropertyTouchesSegmentMatchesSegmentDistance(t *testing.T) {
	// The fast hit test used by Solid.SegmentHits gives the same answer as
	// SegmentDistance == 0, including for segments that end on a vertex or
	// run along an edge.
	rng := rand.New(rand.NewPCG(15, 16))
	for si, ring := range randomShapes(rng, 40) {
		f := Polygon(ring)
		bound := f.Bound().Pad(indexPad)
		for k := range 300 {
			a := orb.Point{-25 + 50*rng.Float64(), -25 + 50*rng.Float64()}
			b := orb.Point{a[0] - 6 + 12*rng.Float64(), a[1] - 6 + 12*rng.Float64()}
			switch k % 4 {
			case 1:
				b = ring[rng.IntN(len(ring))] // ends on a vertex
			case 2:
				i := rng.IntN(len(ring) - 1)
				a, b = ring[i], ring[i+1] // an edge itself
			case 3:
				b = a // zero length
			}
			want := f.SegmentDistance(a, b) == 0
			if got := f.touchesSegment(a, b, bound); got != want {
				t.Fatalf("shape %d, segment %v-%v: got %v, want %v", si, a, b, got, want)
			}
		}
	}
}
