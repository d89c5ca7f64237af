package geometry

import (
	"math"
	"math/rand/v2"
	"testing"

	"github.com/paulmach/orb"
)

func TestFootprintContainsDistance(t *testing.T) {
	sq2 := math.Sqrt2
	// All hand-computed: distances to the nearest edge or vertex.
	tests := []struct {
		name   string
		f      Footprint
		p      orb.Point
		wantIn bool
		want   float64 // signed distance, m
	}{
		{"square centre", Polygon(unitSquare), orb.Point{0.5, 0.5}, true, -0.5},
		{"square off-centre", Polygon(unitSquare), orb.Point{0.25, 0.6}, true, -0.25},
		{"square right of", Polygon(unitSquare), orb.Point{1.5, 0.5}, false, 0.5},
		{"square diagonal out", Polygon(unitSquare), orb.Point{2, 2}, false, sq2},
		{"square below-left", Polygon(unitSquare), orb.Point{-1, -1}, false, sq2},
		{"square on edge", Polygon(unitSquare), orb.Point{1, 0.5}, true, 0},
		{"square on vertex", Polygon(unitSquare), orb.Point{1, 1}, true, 0},
		{"square on origin vertex", Polygon(unitSquare), orb.Point{0, 0}, true, 0},
		{"square clockwise input", Polygon(reversed(unitSquare)), orb.Point{0.5, 0.25}, true, -0.25},
		{"L arm corner square", Polygon(lRoom), orb.Point{0.5, 0.5}, true, -0.5},
		{"L upper arm", Polygon(lRoom), orb.Point{0.5, 1.5}, true, -0.5},
		{"L right arm", Polygon(lRoom), orb.Point{1.5, 0.5}, true, -0.5},
		{"L notch centre", Polygon(lRoom), orb.Point{1.5, 1.5}, false, 0.5},
		{"L notch near lower edge", Polygon(lRoom), orb.Point{1.5, 1.2}, false, 0.2},
		{"L inside near reflex corner", Polygon(lRoom), orb.Point{0.9, 0.9}, true, -math.Sqrt(0.02)},
		{"L on reflex corner", Polygon(lRoom), orb.Point{1, 1}, true, 0},
		{"L on inner edge", Polygon(lRoom), orb.Point{1, 1.5}, true, 0},
		{"L far out, nearest vertex (1,2)", Polygon(lRoom), orb.Point{5, 6}, false, 4 * sq2},
		{"sloped edge midpoint", Polygon(orb.Ring{{0, 0}, {0.3, 0.1}, {0, 0.7}, {0, 0}}), orb.Point{0.15, 0.4}, true, 0},
		{"circle centre", Circle(orb.Point{2, 3}, 1), orb.Point{2, 3}, true, -1},
		{"circle on rim", Circle(orb.Point{2, 3}, 1), orb.Point{3, 3}, true, 0},
		{"circle on rim 3-4-5", Circle(orb.Point{2, 3}, 1), orb.Point{2.6, 3.8}, true, 0},
		{"circle outside", Circle(orb.Point{2, 3}, 1), orb.Point{2, 4.5}, false, 0.5},
		{"circle inside", Circle(orb.Point{2, 3}, 1), orb.Point{2.3, 3.4}, true, -0.5},
		{"zero-radius circle at it", Circle(orb.Point{1, 1}, 0), orb.Point{1, 1}, true, 0},
		{"zero-radius circle away", Circle(orb.Point{1, 1}, 0), orb.Point{4, 5}, false, 5},
		{"zero Footprint is the datum", Footprint{}, orb.Point{3, 4}, false, 5},
		{"degenerate segment polygon on it", Polygon(orb.Ring{{0, 0}, {2, 0}, {0, 0}}), orb.Point{1, 0}, true, 0},
		{"degenerate segment polygon off it", Polygon(orb.Ring{{0, 0}, {2, 0}, {0, 0}}), orb.Point{1, 1}, false, 1},
		{"degenerate point polygon", Polygon(orb.Ring{{1, 1}, {1, 1}}), orb.Point{1, 2}, false, 1},
		{"NaN point", Polygon(unitSquare), orb.Point{math.NaN(), 0.5}, false, math.NaN()},
		{"NaN point, circle", Circle(orb.Point{}, 1), orb.Point{0, math.NaN()}, false, math.NaN()},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := tt.f.Contains(tt.p); got != tt.wantIn {
				t.Errorf("Contains(%v): got %v, want %v", tt.p, got, tt.wantIn)
			}
			if got := tt.f.Distance(tt.p); !near(got, tt.want, 1e-12) {
				t.Errorf("Distance(%v): got %.15g, want %.15g", tt.p, got, tt.want)
			}
		})
	}
}

func TestPolygonNormalises(t *testing.T) {
	// Hand-computed: the expected ring is the input with zero-length edges
	// dropped, closed, and counter-clockwise.
	tests := []struct {
		name string
		in   orb.Ring
		want orb.Ring
	}{
		{"already normal", unitSquare, unitSquare},
		{"clockwise reversed", reversed(unitSquare), orb.Ring{{0, 0}, {1, 0}, {1, 1}, {0, 1}, {0, 0}}},
		{"open ring closed", orb.Ring{{0, 0}, {1, 0}, {1, 1}, {0, 1}}, unitSquare},
		{"zero-length edges dropped",
			orb.Ring{{0, 0}, {0, 0}, {1, 0}, {1, 0}, {1, 1}, {0, 1}, {0, 1}, {0, 0}, {0, 0}}, unitSquare},
		{"vertex within BoundaryTol dropped",
			orb.Ring{{0, 0}, {1, 0}, {1, 1e-10}, {1, 1}, {0, 1}, {0, 0}}, unitSquare},
		{"collinear vertex kept",
			orb.Ring{{0, 0}, {0.5, 0}, {1, 0}, {1, 1}, {0, 1}, {0, 0}},
			orb.Ring{{0, 0}, {0.5, 0}, {1, 0}, {1, 1}, {0, 1}, {0, 0}}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			in := tt.in.Clone()
			got := Polygon(in).Ring
			if !got.Equal(tt.want) {
				t.Errorf("got %v, want %v", got, tt.want)
			}
			if !in.Equal(tt.in) {
				t.Errorf("Polygon changed its argument: got %v, want %v", in, tt.in)
			}
		})
	}
}

func TestCollinearVertexHarmless(t *testing.T) {
	plain := Polygon(unitSquare)
	extra := Polygon(orb.Ring{{0, 0}, {0.5, 0}, {1, 0}, {1, 1}, {0, 1}, {0, 0}})
	rng := rand.New(rand.NewPCG(7, 7))
	for range 500 {
		p := orb.Point{-0.5 + 2*rng.Float64(), -0.5 + 2*rng.Float64()}
		if got, want := extra.Distance(p), plain.Distance(p); !near(got, want, 1e-15) {
			t.Fatalf("Distance(%v) with a collinear vertex: got %g, want %g", p, got, want)
		}
	}
}

func TestConstructorPanics(t *testing.T) {
	mustPanic(t, "Polygon(empty)", func() { Polygon(nil) })
	mustPanic(t, "Polygon(NaN vertex)", func() { Polygon(orb.Ring{{0, 0}, {math.NaN(), 1}, {1, 1}, {0, 0}}) })
	mustPanic(t, "Circle(negative radius)", func() { Circle(orb.Point{}, -1) })
	mustPanic(t, "Circle(Inf centre)", func() { Circle(orb.Point{math.Inf(1), 0}, 1) })
	mustPanic(t, "Outline(2)", func() { Circle(orb.Point{}, 1).Outline(2) })
}

func TestSegmentDistance(t *testing.T) {
	sq := Polygon(unitSquare)
	disc := Circle(orb.Point{0, 0}, 1)
	// Hand-computed.
	tests := []struct {
		name string
		f    Footprint
		a, b orb.Point
		want float64
	}{
		{"parallel beside", sq, orb.Point{2, 0}, orb.Point{2, 1}, 1},
		{"inside", sq, orb.Point{0.2, 0.2}, orb.Point{0.8, 0.8}, 0},
		{"crossing both sides", sq, orb.Point{-1, 0.5}, orb.Point{2, 0.5}, 0},
		{"crossing a corner region", sq, orb.Point{1.5, 0}, orb.Point{0, 1.5}, 0},
		{"touching a vertex", sq, orb.Point{1, 1}, orb.Point{2, 2}, 0},
		{"along an edge", sq, orb.Point{-1, 0}, orb.Point{3, 0}, 0},
		{"above", sq, orb.Point{-1, 2}, orb.Point{2, 2}, 1},
		{"nearest at an end", sq, orb.Point{2, -1}, orb.Point{3, 0}, math.Sqrt2},
		{"zero length outside", sq, orb.Point{3, 0.5}, orb.Point{3, 0.5}, 2},
		{"zero length inside", sq, orb.Point{0.5, 0.5}, orb.Point{0.5, 0.5}, 0},
		{"circle tangent line above", disc, orb.Point{-2, 2}, orb.Point{2, 2}, 1},
		{"circle chord", disc, orb.Point{-2, 0.5}, orb.Point{2, 0.5}, 0},
		{"circle tangent", disc, orb.Point{-2, 1}, orb.Point{2, 1}, 0},
		{"circle radial, outside", disc, orb.Point{3, 0}, orb.Point{5, 0}, 2},
		{"circle inside", disc, orb.Point{0.1, 0}, orb.Point{0.2, 0.1}, 0},
		{"circle zero length", disc, orb.Point{0, 3}, orb.Point{0, 3}, 2},
		{"zero-radius circle on the segment", Circle(orb.Point{1, 1}, 0), orb.Point{0, 0}, orb.Point{2, 2}, 0},
		{"NaN end", sq, orb.Point{math.NaN(), 0}, orb.Point{2, 2}, math.NaN()},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := tt.f.SegmentDistance(tt.a, tt.b); !near(got, tt.want, 1e-12) {
				t.Errorf("SegmentDistance(%v, %v): got %.15g, want %.15g", tt.a, tt.b, got, tt.want)
			}
			if got := tt.f.SegmentDistance(tt.b, tt.a); !near(got, tt.want, 1e-12) {
				t.Errorf("SegmentDistance(%v, %v) reversed: got %.15g, want %.15g", tt.b, tt.a, got, tt.want)
			}
		})
	}
}

func TestBoundAreaOutline(t *testing.T) {
	// Hand-computed.
	if got, want := Polygon(lRoom).Bound(), (orb.Bound{Min: orb.Point{0, 0}, Max: orb.Point{2, 2}}); got != want {
		t.Errorf("L room Bound: got %v, want %v", got, want)
	}
	if got, want := Circle(orb.Point{2, 3}, 1).Bound(), (orb.Bound{Min: orb.Point{1, 2}, Max: orb.Point{3, 4}}); got != want {
		t.Errorf("circle Bound: got %v, want %v", got, want)
	}
	if got, want := Polygon(reversed(lRoom)).Area(), 3.0; !near(got, want, 1e-12) {
		t.Errorf("L room Area: got %g, want %g", got, want)
	}
	if got, want := Circle(orb.Point{}, 2).Area(), 4*math.Pi; !near(got, want, 1e-12) {
		t.Errorf("circle Area: got %g, want %g", got, want)
	}
	out := Circle(orb.Point{1, 1}, 2).Outline(4)
	want := orb.Ring{{3, 1}, {1, 3}, {-1, 1}, {1, -1}, {3, 1}}
	if len(out) != len(want) {
		t.Fatalf("Outline(4): got %d vertices, want %d", len(out), len(want))
	}
	for i := range want {
		if !near(out[i][0], want[i][0], 1e-12) || !near(out[i][1], want[i][1], 1e-12) {
			t.Errorf("Outline(4) vertex %d: got %v, want %v", i, out[i], want[i])
		}
	}
	if o := Circle(orb.Point{}, 1).Outline(12); o.Orientation() != orb.CCW || !o.Closed() {
		t.Errorf("Outline(12): got orientation %v closed %v, want CCW and closed", o.Orientation(), o.Closed())
	}
	poly := Polygon(lRoom)
	o := poly.Outline(3)
	o[1] = orb.Point{9, 9}
	if poly.Ring[1] == (orb.Point{9, 9}) {
		t.Errorf("Outline of a polygon: got a ring sharing storage, want a copy")
	}
}
