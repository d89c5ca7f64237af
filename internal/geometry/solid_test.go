package geometry

import (
	"math"
	"math/rand/v2"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestSolidSegmentHits(t *testing.T) {
	cube := Solid{Name: "block", Footprint: Polygon(unitSquare), ZMin: 1, ZMax: 2} // (0,0,1)–(1,1,2)
	pole := Solid{Name: "pole", Footprint: Circle(orb.Point{0, 0}, 0.1), ZMin: 0, ZMax: 2}
	tall := Solid{Name: "zone", Footprint: Polygon(unitSquare), ZMin: 0, ZMax: math.Inf(1)}
	v := func(x, y, z float64) r3.Vec { return r3.Vec{X: x, Y: y, Z: z} }
	// Hand-computed: the clipped parameter range is given where it matters.
	tests := []struct {
		name string
		s    Solid
		a, b r3.Vec
		want bool
	}{
		{"vertical above the top", cube, v(0.5, 0.5, 3), v(0.5, 0.5, 4), false},
		{"horizontal above", cube, v(-1, 0.5, 2.5), v(2, 0.5, 2.5), false},
		{"horizontal below", cube, v(-1, 0.5, 0.5), v(2, 0.5, 0.5), false},
		{"horizontal through", cube, v(-1, 0.5, 1.5), v(2, 0.5, 1.5), true},
		{"horizontal along the top face", cube, v(-1, 0.5, 2), v(2, 0.5, 2), true},
		{"rising through, slab t in [1/3, 2/3], x in [0, 1]", cube, v(-1, 0.5, 0), v(2, 0.5, 3), true},
		{"rising, enters the slab at x = 1: touches the bottom edge", cube, v(-1, 0.5, 0), v(2, 0.5, 1.5), true},
		{"rising, leaves the slab at x = 0: touches the top edge", cube, v(-1, 0.5, 1.5), v(2, 0.5, 3), true},
		{"rising, leaves the slab at x = -0.2: passes over", cube, v(-1, 0.5, 1.6), v(2, 0.5, 3.1), false},
		{"rising, stays below the slab", cube, v(-3, 0.5, 0), v(0, 0.5, 0.9), false},
		{"falling through", cube, v(2, 0.5, 3), v(-1, 0.5, 0), true},
		{"vertical through", cube, v(0.5, 0.5, 0), v(0.5, 0.5, 5), true},
		{"vertical beside", cube, v(1.5, 0.5, 0), v(1.5, 0.5, 5), false},
		{"vertical touching the top", cube, v(0.5, 0.5, 2), v(0.5, 0.5, 3), true},
		{"vertical on a side face", cube, v(1, 0.5, 0), v(1, 0.5, 3), true},
		{"zero length inside", cube, v(0.5, 0.5, 1.5), v(0.5, 0.5, 1.5), true},
		{"zero length above", cube, v(0.5, 0.5, 2.5), v(0.5, 0.5, 2.5), false},
		{"zero length beside", cube, v(1.5, 0.5, 1.5), v(1.5, 0.5, 1.5), false},
		{"tangent to a pole", pole, v(-1, 0.1, 1), v(1, 0.1, 1), true},
		{"beside a pole", pole, v(-1, 0.2, 1), v(1, 0.2, 1), false},
		{"over a pole", pole, v(-1, 0, 2.1), v(1, 0, 2.1), false},
		{"high over an unlimited zone", tall, v(-1, 0.5, 1e3), v(2, 0.5, 1e3), true},
		{"NaN", cube, v(math.NaN(), 0.5, 1.5), v(2, 0.5, 1.5), false},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := tt.s.SegmentHits(tt.a, tt.b); got != tt.want {
				t.Errorf("SegmentHits(%v, %v): got %v, want %v", tt.a, tt.b, got, tt.want)
			}
		})
	}
}

func TestSolidDistance(t *testing.T) {
	cube := Solid{Footprint: Polygon(unitSquare), ZMin: 1, ZMax: 2}
	// Hand-computed.
	tests := []struct {
		name string
		p    r3.Vec
		want float64
	}{
		{"inside", r3.Vec{X: 0.5, Y: 0.5, Z: 1.5}, 0},
		{"on a corner", r3.Vec{X: 1, Y: 1, Z: 2}, 0},
		{"above", r3.Vec{X: 0.5, Y: 0.5, Z: 3}, 1},
		{"below", r3.Vec{X: 0.5, Y: 0.5, Z: 0}, 1},
		{"beside", r3.Vec{X: 2, Y: 0.5, Z: 1.5}, 1},
		{"above and beside", r3.Vec{X: 2, Y: 0.5, Z: 3}, math.Sqrt2},
		{"off a corner", r3.Vec{X: 4, Y: 5, Z: 2}, 5},
		{"3-4-12 off a corner", r3.Vec{X: 4, Y: 5, Z: 14}, 13},
		{"NaN", r3.Vec{X: 0.5, Y: 0.5, Z: math.NaN()}, math.NaN()},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := cube.Distance(tt.p); !near(got, tt.want, 1e-12) {
				t.Errorf("Distance(%v): got %.15g, want %.15g", tt.p, got, tt.want)
			}
		})
	}
}

func TestPropertySolidDistanceZeroExactlyInside(t *testing.T) {
	rng := rand.New(rand.NewPCG(11, 12))
	for si, ring := range randomShapes(rng, 30) {
		s := Solid{Footprint: Polygon(ring), ZMin: rng.Float64(), ZMax: 1 + 2*rng.Float64()}
		if si%5 == 0 {
			s.Footprint = Circle(ring[0], 2*rng.Float64())
		}
		b := s.Footprint.Bound().Pad(1)
		for k := range 300 {
			p := r3.Vec{
				X: b.Min[0] + (b.Max[0]-b.Min[0])*rng.Float64(),
				Y: b.Min[1] + (b.Max[1]-b.Min[1])*rng.Float64(),
				Z: -0.5 + 4*rng.Float64(),
			}
			if k%10 == 0 { // put some points on the top or bottom face plane
				p.Z = s.ZMax
			}
			d := s.Distance(p)
			if (d == 0) != s.Contains(p) {
				t.Fatalf("solid %d, point %v: got Distance %g and Contains %v, want Distance 0 exactly when inside", si, p, d, s.Contains(p))
			}
			if d < 0 {
				t.Fatalf("solid %d, point %v: got Distance %g, want >= 0", si, p, d)
			}
			// The segment from p to itself hits exactly when p is inside.
			if got := s.SegmentHits(p, p); got != (d == 0) {
				t.Fatalf("solid %d, point %v: zero-length SegmentHits got %v, want %v", si, p, got, d == 0)
			}
		}
	}
}

func TestPropertySegmentHitsSampled(t *testing.T) {
	// A segment that misses has no sampled point inside; one that hits has a
	// sampled point within half a sample spacing of the prism.
	rng := rand.New(rand.NewPCG(13, 14))
	for si, ring := range randomShapes(rng, 20) {
		s := Solid{Footprint: Polygon(ring), ZMin: 0.5 + rng.Float64(), ZMax: 2 + rng.Float64()}
		c := s.Footprint.Bound().Center()
		for range 40 {
			a := r3.Vec{X: c[0] - 6 + 12*rng.Float64(), Y: c[1] - 6 + 12*rng.Float64(), Z: 4 * rng.Float64()}
			b := r3.Vec{X: c[0] - 6 + 12*rng.Float64(), Y: c[1] - 6 + 12*rng.Float64(), Z: 4 * rng.Float64()}
			hit := s.SegmentHits(a, b)
			const steps = 2000
			minD := math.Inf(1)
			for k := 0; k <= steps; k++ {
				p := r3.Add(a, r3.Scale(float64(k)/steps, r3.Sub(b, a)))
				minD = math.Min(minD, s.Distance(p))
			}
			half := r3.Norm(r3.Sub(b, a)) / steps / 2
			if !hit && minD == 0 {
				t.Fatalf("solid %d, segment %v-%v: got a miss, but a sampled point is inside", si, a, b)
			}
			if hit && minD > half+1e-12 {
				t.Fatalf("solid %d, segment %v-%v: got a hit, but the nearest sampled point is %g away (spacing/2 %g)", si, a, b, minD, half)
			}
		}
	}
}
