package sheet

import (
	"math"
	"math/rand/v2"
	"testing"
)

// inRingBrute reports whether p lies inside ring by the even-odd crossing
// rule, by brute force over the edges.
func inRingBrute(p Pt, ring []Pt) bool {
	in := false
	for i, j := 0, len(ring)-1; i < len(ring); j, i = i, i+1 {
		a, b := ring[i], ring[j]
		if (a.Y > p.Y) != (b.Y > p.Y) && p.X < a.X+(p.Y-a.Y)/(b.Y-a.Y)*(b.X-a.X) {
			in = !in
		}
	}
	return in
}

// TestHatchMask checks the mask's hatched share of random boxes against
// brute force over the cell centres: a hatched ring with a hole, cut by a
// clip, beside an outline that does not hatch.
func TestHatchMask(t *testing.T) {
	bounds := Rect{10, 20, 100, 60}
	outer := circlePts(Pt{50, 50}, 25, 64)
	hole := circlePts(Pt{50, 50}, 8, 32)
	clip := []Pt{{20, 20}, {70, 20}, {70, 80}, {20, 80}}
	shapes := []Shape{
		{Kind: Polygon, Style: StyleVelocity, Points: outer, Holes: [][]Pt{hole}, Clip: clip},
		{Kind: Polygon, Style: StyleMargin, Points: circlePts(Pt{90, 50}, 10, 32)}, // not hatched
	}
	m := newHatchMask(bounds, shapes)
	if m == nil {
		t.Fatal("got no mask, want one")
	}
	hatched := func(p Pt) bool {
		return inRingBrute(p, outer) && !inRingBrute(p, hole) && inRingBrute(p, clip)
	}
	rng := rand.New(rand.NewPCG(3, 5))
	for k := range 300 {
		r := Rect{bounds.X + 90*rng.Float64(), bounds.Y + 50*rng.Float64(), 1 + 12*rng.Float64(), 1 + 5*rng.Float64()}
		n, in := 0, 0
		for x := bounds.X + hatchCell/2; x < bounds.Right(); x += hatchCell {
			for y := bounds.Y + hatchCell/2; y < bounds.Bottom(); y += hatchCell {
				if x >= r.X && x <= r.Right() && y >= r.Y && y <= r.Bottom() {
					n++
					if hatched(Pt{x, y}) {
						in++
					}
				}
			}
		}
		want := 0.0
		if n > 0 {
			want = float64(in) / float64(n)
		}
		if got := m.frac(r); math.Abs(got-want) > 1e-9 {
			t.Fatalf("box %d %v: got a hatched share of %.4f, want %.4f", k, r, got, want)
		}
	}
	if got := newHatchMask(bounds, shapes[1:]); got != nil {
		t.Error("got a mask of a drawing with no hatch, want nil")
	}
	if got := (*hatchMask)(nil).frac(bounds); got != 0 {
		t.Errorf("a nil mask gave %v, want 0", got)
	}
}
