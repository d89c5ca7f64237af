package sheet

import (
	"fmt"
	"math"
	"math/rand/v2"
	"slices"
	"testing"
)

// TestBoxTree checks every query of the box tree against a test of each
// box in turn (the placer's former grid scan), on boxes scattered over a
// view, boxes piled within a hundredth of a millimetre (a crowd at a
// small scale) and a mix, for many random queries (fixed seed).
func TestBoxTree(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 5))
	for _, tc := range []struct {
		name   string
		n      int
		spread float64 // mm the centres spread over
	}{
		{"scattered", 400, 100},
		{"piled", 2000, 0.01},
		{"crowd", 1500, 5},
		{"few", 5, 20},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var items []pitem
			for i := range tc.n {
				c := Pt{50 + tc.spread*(rng.Float64()-0.5), 40 + tc.spread*(rng.Float64()-0.5)}
				r := 0.6 + 0.4*float64(i%3)
				items = append(items, pitem{r: rectAround(c, r), mark: i%5 != 0})
			}
			tree := newBoxTree(append([]pitem(nil), items...))
			var yes [3]int
			const queries = 2000
			for q := range queries {
				// queries about the boxes, some from inside them
				c := Pt{50 + 1.5*tc.spread*(rng.Float64()-0.5) + 6*(rng.Float64()-0.5), 40 + 1.5*tc.spread*(rng.Float64()-0.5) + 6*(rng.Float64()-0.5)}
				box := Rect{c.X, c.Y, 0.5 + 6*rng.Float64(), 0.5 + 3*rng.Float64()}
				a := Pt{c.X + 8*(rng.Float64()-0.5), c.Y + 8*(rng.Float64()-0.5)}
				if q%3 == 0 {
					a = centre(items[rng.IntN(len(items))].r)
					a.X += 0.9 * (rng.Float64() - 0.5)
				}
				gap := 6 * rng.Float64()
				var over, hit, near bool
				count := 0
				for _, it := range items {
					if it.r.Overlaps(box, 0) {
						over = true
						count++
					}
					if !(it.r.X < a.X && a.X < it.r.Right() && it.r.Y < a.Y && a.Y < it.r.Bottom()) && segHitsRect(a, c, it.r, leaderGap) {
						hit = true
					}
					if it.mark && !(it.r.X <= a.X && a.X <= it.r.Right() && it.r.Y <= a.Y && a.Y <= it.r.Bottom()) {
						m := centre(it.r)
						if dist(rectEdgePoint(box, m), m) < gap {
							near = true
						}
					}
				}
				what := fmt.Sprintf("query %d (box %v, a %v, gap %.2f)", q, box, a, gap)
				if got := tree.overlaps(box); got != over {
					t.Fatalf("%s: overlaps %v, want %v", what, got, over)
				}
				if got := tree.count(box); got != count {
					t.Fatalf("%s: count %d, want %d", what, got, count)
				}
				if got := tree.segHits(a, c, leaderGap); got != hit {
					t.Fatalf("%s: segHits %v, want %v", what, got, hit)
				}
				if got := tree.markNear(box, a, gap); got != near {
					t.Fatalf("%s: markNear %v, want %v", what, got, near)
				}
				for i, b := range []bool{over, hit, near} {
					if b {
						yes[i]++
					}
				}
			}
			// the queries must try both answers of each test
			for i, n := range yes {
				if tc.n > 100 && (n < queries/50 || n > queries-queries/50) {
					t.Errorf("test %d: %d of %d queries true, want a mix", i, n, queries)
				}
			}
		})
	}
}

// TestNearestBeyond checks the point tree's nearest neighbour beyond a
// distance against a test of every point, on scattered points, points
// piled within 0.2 mm with a few apart, and points on a line, in full
// and cut to a range.
func TestNearestBeyond(t *testing.T) {
	rng := rand.New(rand.NewPCG(5, 8))
	for _, tc := range []struct {
		name string
		pts  func(i int) Pt
		n    int
	}{
		{"scattered", func(int) Pt { return Pt{100 * rng.Float64(), 80 * rng.Float64()} }, 500},
		{"piled", func(i int) Pt {
			if i%100 == 0 {
				return Pt{50 + 3*rng.Float64(), 50 + 3*rng.Float64()}
			}
			return Pt{50 + 0.15*rng.Float64(), 50 + 0.1*rng.Float64()}
		}, 1500},
		{"line", func(i int) Pt { return Pt{10 + 0.05*float64(i), 20} }, 800},
		{"one spot", func(int) Pt { return Pt{30 + 0.1*rng.Float64(), 30} }, 50},
	} {
		t.Run(tc.name, func(t *testing.T) {
			pts := make([]Pt, tc.n)
			for i := range pts {
				pts[i] = tc.pts(i)
			}
			tree := newPointTree(pts)
			for i, p := range pts {
				want := math.Inf(1)
				for _, q := range pts {
					if d := dist(p, q); d > 0.2 && d < want {
						want = d
					}
				}
				if got := tree.nearestBeyond(p, 0.2, 0, math.Inf(1)); got != want {
					t.Fatalf("point %d %v: got %v, want %v", i, p, got, want)
				}
				// cut to [lo, hi]: exact between, at most lo below, hi above
				const lo, hi = 0.3, 0.9
				got := tree.nearestBeyond(p, 0.2, lo, hi)
				switch {
				case math.IsInf(want, 1):
					if !math.IsInf(got, 1) {
						t.Fatalf("point %d %v: cut: got %v, want +Inf", i, p, got)
					}
				case want <= lo && got > lo, want > lo && want < hi && got != want, want >= hi && got != hi:
					t.Fatalf("point %d %v: cut to [%v, %v]: got %v for %v", i, p, lo, hi, got, want)
				}
			}
		})
	}
}

// TestMarkRadius checks the symbol radius against the median of every
// station's nearest neighbour more than 0.2 mm away found by testing
// every other station, for stations from 0.05 mm to 8 mm apart on a
// jittered grid, with some piled on one spot.
func TestMarkRadius(t *testing.T) {
	rng := rand.New(rand.NewPCG(13, 21))
	for _, step := range []float64{0.05, 0.3, 1, 1.5, 2.5, 3, 4, 8} {
		for _, piled := range []int{0, 7} {
			var pts []Pt
			for i := range 400 {
				p := Pt{step * (float64(i%20) + 0.3*rng.Float64()), step * (float64(i/20) + 0.3*rng.Float64())}
				if piled > 0 && i%piled == 0 {
					p = Pt{0.01 * rng.Float64(), 0}
				}
				pts = append(pts, p)
			}
			var nn []float64
			for _, p := range pts {
				best := math.Inf(1)
				for _, q := range pts {
					if d := dist(p, q); d > 0.2 && d < best {
						best = d
					}
				}
				if !math.IsInf(best, 1) {
					nn = append(nn, best)
				}
			}
			slices.Sort(nn)
			want := clamp(0.4*nn[len(nn)/2], 0.5, 1.1)
			if got := markRadius(pts); got != want {
				t.Errorf("step %v mm, every %dth piled: got %v, want %v", step, piled, got, want)
			}
		}
	}
}

// TestPlacerCrowd checks the placer's queries against a test of every box
// and leader in turn where symbols pile up beyond a grid cell's share
// (cellCap), some added after the first queries, with labels and leaders
// placed round the pile.
func TestPlacerCrowd(t *testing.T) {
	rng := rand.New(rand.NewPCG(17, 19))
	pl := newPlacer(Rect{0, 0, 120, 80})
	var all []pitem
	add := func(n int, spread float64) {
		for range n {
			c := Pt{60 + spread*(rng.Float64()-0.5), 40 + spread*(rng.Float64()-0.5)}
			r := rectAround(c, 0.7)
			pl.mark(r)
			all = append(all, pitem{r: r, mark: true})
		}
	}
	add(300, 0.05)
	add(200, 6)
	for i := range 400 {
		if i == 200 {
			add(100, 2) // more symbols after some labels
		}
		a := centre(all[rng.IntN(len(all))].r)
		s, ok := pl.find(want{w: 5, h: 2.2, anchor: a, clear: 0.9, dir: Pt{1, 0}}, idFar)
		if !ok {
			continue
		}
		pl.commit(s)
		all = append(all, pitem{r: s.box, label: true})
		if s.leader {
			all = append(all, pitem{a: s.from, b: s.to, seg: true})
		}
	}
	for q := range 3000 {
		c := Pt{60 + 30*(rng.Float64()-0.5), 40 + 30*(rng.Float64()-0.5)}
		box := Rect{c.X, c.Y, 1 + 6*rng.Float64(), 1 + 2*rng.Float64()}
		a := centre(all[rng.IntN(len(all))].r)
		gap := 5 * rng.Float64()
		grown := Rect{box.X - labelGap, box.Y - labelGap, box.W + 2*labelGap, box.H + 2*labelGap}
		free, clear, near := pl.bounds.Contains(box), true, false
		for _, it := range all {
			if it.seg {
				free = free && !segHitsRect(it.a, it.b, grown, 0)
				continue
			}
			free = free && !it.r.Overlaps(grown, 0)
			if !bndOf(it.r).holdsOpen(a) && segHitsRect(a, c, it.r, leaderGap) {
				clear = false
			}
			if m := centre(it.r); it.mark && !bndOf(it.r).holds(a) && dist(rectEdgePoint(box, m), m) < gap {
				near = true
			}
		}
		if got := pl.free(box); got != free {
			t.Fatalf("query %d: free(%v) = %v, want %v", q, box, got, free)
		}
		if got := pl.clearPath(a, c); got != clear {
			t.Fatalf("query %d: clearPath(%v, %v) = %v, want %v", q, a, c, got, clear)
		}
		if got := pl.nearerMark(box, a, gap); got != near {
			t.Fatalf("query %d: nearerMark(%v, %v, %.2f) = %v, want %v", q, box, a, gap, got, near)
		}
	}
	if len(pl.fixed) == 0 {
		t.Error("no symbol went to the tree: the test does not crowd a cell")
	}
}
