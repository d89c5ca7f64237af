package geometry

import (
	"math"
	"testing"

	"github.com/paulmach/orb"
)

func TestFreeRay(t *testing.T) {
	pi := math.Pi
	sq2 := math.Sqrt2
	square := &Cell{Boundary: unitSquare}
	lCell := &Cell{Boundary: lRoom}
	// Hand-computed: distance along the ray to where it leaves the room.
	tests := []struct {
		name    string
		c       *Cell
		from    orb.Point
		heading float64
		want    float64
	}{
		{"square centre +X", square, orb.Point{0.5, 0.5}, 0, 0.5},
		{"square centre +Y", square, orb.Point{0.5, 0.5}, pi / 2, 0.5},
		{"square centre -X", square, orb.Point{0.5, 0.5}, pi, 0.5},
		{"square centre -Y", square, orb.Point{0.5, 0.5}, -pi / 2, 0.5},
		{"square centre diagonal through a vertex", square, orb.Point{0.5, 0.5}, pi / 4, sq2 / 2},
		{"square centre other diagonal", square, orb.Point{0.5, 0.5}, 3 * pi / 4, sq2 / 2},
		{"square off-centre slope 1/2", square, orb.Point{0.5, 0.5}, math.Atan2(1, 2), math.Hypot(0.5, 0.25)},
		{"along an edge", square, orb.Point{0.5, 0}, 0, 0.5},
		{"from a corner along an edge", square, orb.Point{0, 0}, 0, 1},
		{"from a corner outward", square, orb.Point{0, 0}, pi, 0},
		{"from a corner across the diagonal", square, orb.Point{0, 0}, pi / 4, sq2},
		{"from an edge outward", square, orb.Point{1, 0.5}, 0, 0},
		{"from an edge inward", square, orb.Point{1, 0.5}, pi, 1},
		{"outside", square, orb.Point{2, 2}, pi + pi/4, 0},
		{"L arm +X", lCell, orb.Point{0.5, 0.5}, 0, 1.5},
		{"L arm +Y", lCell, orb.Point{0.5, 0.5}, pi / 2, 1.5},
		{"L arm -X", lCell, orb.Point{0.5, 0.5}, pi, 0.5},
		{"L arm -Y", lCell, orb.Point{0.5, 0.5}, 3 * pi / 2, 0.5},
		{"L diagonal leaves at the reflex corner", lCell, orb.Point{0.5, 0.5}, pi / 4, sq2 / 2},
		{"L diagonal back to origin", lCell, orb.Point{0.5, 0.5}, 5 * pi / 4, sq2 / 2},
		{"L grazing the reflex corner carries on", lCell, orb.Point{1.5, 0.5}, 3 * pi / 4, 1.5 * sq2},
		{"reflex corner +X along edge", lCell, orb.Point{1, 1}, 0, 1},
		{"reflex corner +Y along edge", lCell, orb.Point{1, 1}, pi / 2, 1},
		{"reflex corner -X", lCell, orb.Point{1, 1}, pi, 1},
		{"reflex corner -Y", lCell, orb.Point{1, 1}, 3 * pi / 2, 1},
		{"reflex corner into the notch", lCell, orb.Point{1, 1}, pi / 4, 0},
		{"reflex corner to origin", lCell, orb.Point{1, 1}, 5 * pi / 4, sq2},
		{"reflex corner to (0,2)", lCell, orb.Point{1, 1}, 3 * pi / 4, sq2},
		{"reflex corner to (2,0)", lCell, orb.Point{1, 1}, -pi / 4, sq2},
		{"heading wraps", lCell, orb.Point{0.5, 0.5}, 2*pi + pi/2, 1.5},
		{"unbounded", &Cell{}, orb.Point{3, 4}, 1, math.Inf(1)},
		{"NaN heading", square, orb.Point{0.5, 0.5}, math.NaN(), math.NaN()},
		{"Inf heading", square, orb.Point{0.5, 0.5}, math.Inf(1), math.NaN()},
		{"NaN point", square, orb.Point{math.NaN(), 0.5}, 0, math.NaN()},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := tt.c.FreeRay(tt.from, tt.heading); !near(got, tt.want, 1e-12) {
				t.Errorf("FreeRay(%v, %g): got %.15g, want %.15g", tt.from, tt.heading, got, tt.want)
			}
			if !tt.c.Bounded() {
				return
			}
			cw := &Cell{Boundary: reversed(tt.c.Boundary)}
			if got := cw.FreeRay(tt.from, tt.heading); !near(got, tt.want, 1e-12) {
				t.Errorf("clockwise boundary: FreeRay(%v, %g): got %.15g, want %.15g", tt.from, tt.heading, got, tt.want)
			}
		})
	}
}

func TestFreeRayStaysInside(t *testing.T) {
	// Property: on a non-convex room, every sampled point of the free ray is
	// inside and a point a little beyond its end is outside.
	c := &Cell{Boundary: orb.Ring{{0, 0}, {6, 0}, {6, 4}, {4, 4}, {4, 1}, {2, 1}, {2, 4}, {0, 4}, {0, 0}}}
	for _, from := range []orb.Point{{1, 1}, {5, 3}, {3, 0.5}, {0.5, 3.5}} {
		for k := range 72 {
			h := float64(k) * math.Pi / 36
			d := c.FreeRay(from, h)
			s, co := math.Sincos(h)
			for i := 0; i <= 50; i++ {
				q := float64(i) / 50 * d
				if p := (orb.Point{from[0] + q*co, from[1] + q*s}); !c.Contains(p) {
					t.Fatalf("from %v heading %g: got free distance %g but %v at %g is outside", from, h, d, p, q)
				}
			}
			if p := (orb.Point{from[0] + (d+1e-6)*co, from[1] + (d+1e-6)*s}); c.Contains(p) {
				t.Fatalf("from %v heading %g: got free distance %g but %v just beyond is still inside", from, h, d, p)
			}
		}
	}
}
