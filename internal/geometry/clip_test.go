package geometry

import (
	"math"
	"math/rand/v2"
	"testing"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/planar"
)

// ringsArea returns the summed area of rs, m².
func ringsArea(rs []orb.Ring) float64 {
	a := 0.0
	for _, r := range rs {
		a += math.Abs(planar.Area(r))
	}
	return a
}

// TestIntersectRings checks hand-computed cases: overlapping boxes, a box
// inside another, disjoint boxes, and a long strip across a U-shaped room
// that the room cuts into two pieces.
func TestIntersectRings(t *testing.T) {
	// the U: 0–6 × 0–4 less the notch 2–4 × 1–4
	u := orb.Ring{{0, 0}, {6, 0}, {6, 4}, {4, 4}, {4, 1}, {2, 1}, {2, 4}, {0, 4}, {0, 0}}
	for _, tt := range []struct {
		name          string
		subject, clip orb.Ring
		rings         int
		area          float64
	}{
		{"overlap", box(0, 0, 2, 2), box(1, 1, 3, 3), 1, 1},
		{"inside", box(1, 1, 2, 2), box(0, 0, 3, 3), 1, 1},
		{"contains the clip", box(0, 0, 3, 3), box(1, 1, 2, 2), 1, 1},
		{"disjoint", box(0, 0, 1, 1), box(2, 2, 3, 3), 0, 0},
		{"strip across the U", reversed(box(-1, 2, 7, 3)), u, 2, 4},
		{"strip along the U's base", box(-1, 0.25, 7, 0.75), u, 1, 3},
	} {
		t.Run(tt.name, func(t *testing.T) {
			got, err := IntersectRings(tt.subject, tt.clip)
			if err != nil {
				t.Fatal(err)
			}
			if len(got) != tt.rings || math.Abs(ringsArea(got)-tt.area) > 1e-12 {
				t.Fatalf("got %d rings of area %g, want %d of %g: %v", len(got), ringsArea(got), tt.rings, tt.area, got)
			}
			for _, r := range got {
				if r.Orientation() != orb.CCW || r[0] != r[len(r)-1] {
					t.Errorf("ring %v: want closed and counter-clockwise", r)
				}
			}
		})
	}
	// boxes sharing an edge, and a box whose corner lies on the other's
	// edge: resolved by a micrometre's move (areas to within 1e-5 m²)
	for _, tt := range []struct {
		a, b orb.Ring
		area float64
	}{{box(0, 0, 2, 2), box(2, 0, 4, 2), 0}, {box(0, 0, 2, 2), box(1, 0, 3, 2), 2}, {box(0, 0, 2, 2), box(1, -1, 3, 1), 1}} {
		got, err := IntersectRings(tt.a, tt.b)
		if err != nil || math.Abs(ringsArea(got)-tt.area) > 1e-5 {
			t.Errorf("%v ∩ %v: got %v of area %g, %v; want area %g", tt.a, tt.b, got, ringsArea(got), err, tt.area)
		}
	}
}

// TestPropertyIntersectArea: the area of the intersection of random star
// polygons matches a brute-force estimate on a fine grid (within the grid's
// resolution), and the result never leaves either polygon.
func TestPropertyIntersectArea(t *testing.T) {
	rng := rand.New(rand.NewPCG(51, 52))
	for k := range 25 {
		s := starRing(rng, orb.Point{rng.Float64(), rng.Float64()}, 5+rng.IntN(40), 0.5, 3)
		c := starRing(rng, orb.Point{rng.Float64(), rng.Float64()}, 4+rng.IntN(30), 0.5, 3)
		got, err := IntersectRings(s, c)
		if err != nil {
			t.Fatal(err)
		}
		const n, lo, hi = 400, -3.5, 4.5
		h := (hi - lo) / n
		in := 0
		for i := range n {
			for j := range n {
				p := orb.Point{lo + (float64(i)+0.5)*h, lo + (float64(j)+0.5)*h}
				if ringInside(s, p) && ringInside(c, p) {
					in++
				}
			}
		}
		want := float64(in) * h * h
		if math.Abs(ringsArea(got)-want) > 0.05+0.01*want {
			t.Fatalf("pair %d: area %g, grid estimate %g", k, ringsArea(got), want)
		}
		for _, r := range got {
			for _, p := range r {
				if (!ringInside(s, p) && signedRingDistance(s, p) > 1e-9) || (!ringInside(c, p) && signedRingDistance(c, p) > 1e-9) {
					t.Fatalf("pair %d: vertex %v outside an input", k, p)
				}
			}
		}
	}
}

// FuzzIntersectRings: for any two outlines that CheckRing accepts, the cut
// gives closed counter-clockwise rings whose area is at most that of
// either outline, and never panics on any input.
func FuzzIntersectRings(f *testing.F) {
	f.Add(encodeRing(unitSquare), encodeRing(lRoom))
	f.Add(encodeRing(box(0, 0, 2, 2)), encodeRing(box(2, 0, 4, 2)))
	f.Add(encodeRing(reversed(lRoom)), encodeRing(box(0.5, -1, 1.5, 3)))
	f.Fuzz(func(t *testing.T, a, b []byte) {
		s, c := decodeRing(a), decodeRing(b)
		got, err := IntersectRings(s, c)
		if CheckRing(s) != nil || CheckRing(c) != nil || err != nil {
			return
		}
		area := ringsArea(got)
		lim := math.Min(math.Abs(planar.Area(s)), math.Abs(planar.Area(c)))
		if math.IsNaN(area) || area > lim*(1+1e-9)+1e-9 {
			t.Fatalf("%v ∩ %v: area %g, more than the smaller outline's %g", s, c, area, lim)
		}
		for _, r := range got {
			if len(r) < 4 || r[0] != r[len(r)-1] || r.Orientation() != orb.CCW {
				t.Fatalf("%v ∩ %v: ring %v not closed and counter-clockwise", s, c, r)
			}
		}
	})
}
