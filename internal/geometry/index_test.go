package geometry

import (
	"math"
	"math/rand/v2"
	"slices"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"
)

// randomSolids returns n solids scattered over a w × h m floor: small and
// large polygons, thin poles and a few unlimited-height zones.
func randomSolids(rng *rand.Rand, n int, w, h float64) []Solid {
	out := make([]Solid, n)
	for i := range out {
		c := orb.Point{w * rng.Float64(), h * rng.Float64()}
		s := Solid{ZMin: 2 * rng.Float64()}
		s.ZMax = s.ZMin + 0.1 + 2*rng.Float64()
		switch i % 5 {
		case 0:
			s.Footprint = Circle(c, 0.01+0.05*rng.Float64()) // pole
		case 1:
			s.Footprint = Polygon(starRing(rng, c, 3+rng.IntN(6), 0.2, 1.5))
		case 2:
			s.Footprint = Polygon(starRing(rng, c, 4, 0.5, 0.5))
		case 3:
			s.Footprint = Polygon(starRing(rng, c, 8, 2, 5)) // large: spans many grid cells
		default:
			s.Footprint = Circle(c, 0.5*rng.Float64())
			if rng.IntN(4) == 0 {
				s.ZMin, s.ZMax = 0, math.Inf(1)
			}
		}
		out[i] = s
	}
	return out
}

func bruteSegmentHits(solids []Solid, a, b r3.Vec) []int {
	var out []int
	for i, s := range solids {
		if s.SegmentHits(a, b) {
			out = append(out, i)
		}
	}
	return out
}

func bruteNear(solids []Solid, p orb.Point, radius float64) []int {
	var out []int
	for i, s := range solids {
		if s.Footprint.Distance(p) <= radius {
			out = append(out, i)
		}
	}
	return out
}

func TestPropertyIndexMatchesBruteForce(t *testing.T) {
	rng := rand.New(rand.NewPCG(21, 22))
	for _, n := range []int{0, 1, 7, 300} {
		solids := randomSolids(rng, n, 40, 25)
		ix := NewIndex(solids)
		if ix.Len() != n {
			t.Fatalf("n=%d: got Len %d, want %d", n, ix.Len(), n)
		}
		prefix := []int{-7}
		for q := range 3000 {
			a := r3.Vec{X: -5 + 50*rng.Float64(), Y: -5 + 35*rng.Float64(), Z: 4 * rng.Float64()}
			b := r3.Vec{X: -5 + 50*rng.Float64(), Y: -5 + 35*rng.Float64(), Z: 4 * rng.Float64()}
			switch q % 6 {
			case 1: // short
				b = r3.Add(a, r3.Vec{X: rng.Float64() - 0.5, Y: rng.Float64() - 0.5, Z: rng.Float64() - 0.5})
			case 2: // vertical
				b.X, b.Y = a.X, a.Y
			case 3: // horizontal
				b.Z = a.Z
			case 4: // zero length
				b = a
			case 5: // axis-parallel in plan
				b.Y = a.Y
			}
			got := ix.AppendSegmentHits(slices.Clone(prefix), a, b)
			want := append(slices.Clone(prefix), bruteSegmentHits(solids, a, b)...)
			if !slices.Equal(got, want) {
				t.Fatalf("n=%d, segment %v-%v: got %v, want %v", n, a, b, got, want)
			}

			p := orb.Point{-5 + 50*rng.Float64(), -5 + 35*rng.Float64()}
			radius := []float64{0, 0.3, 2, 10, 100}[q%5] * rng.Float64()
			gotN := ix.AppendNear(slices.Clone(prefix), p, radius)
			wantN := append(slices.Clone(prefix), bruteNear(solids, p, radius)...)
			if !slices.Equal(gotN, wantN) {
				t.Fatalf("n=%d, point %v radius %g: got %v, want %v", n, p, radius, gotN, wantN)
			}
		}
	}
}

func TestIndexEdgeCases(t *testing.T) {
	// Hand-computed: three poles at the same point (a grid of zero size), a
	// unit block, and queries touching them exactly.
	solids := []Solid{
		{Name: "p0", Footprint: Circle(orb.Point{5, 5}, 0), ZMin: 0, ZMax: 2},
		{Name: "p1", Footprint: Circle(orb.Point{5, 5}, 0), ZMin: 0, ZMax: 2},
		{Name: "block", Footprint: Polygon(box(0, 0, 1, 1)), ZMin: 0, ZMax: 1},
	}
	ix := NewIndex(solids)
	tests := []struct {
		name string
		got  []int
		want []int
	}{
		{"segment through both poles", ix.AppendSegmentHits(nil, r3.Vec{X: 4, Y: 5, Z: 1}, r3.Vec{X: 6, Y: 5, Z: 1}), []int{0, 1}},
		{"segment touching the block corner", ix.AppendSegmentHits(nil, r3.Vec{X: 1, Y: 1, Z: 1}, r3.Vec{X: 3, Y: 3, Z: 1}), []int{2}},
		{"segment over everything", ix.AppendSegmentHits(nil, r3.Vec{X: 0, Y: 0, Z: 2.5}, r3.Vec{X: 6, Y: 6, Z: 2.5}), nil},
		{"segment outside the grid", ix.AppendSegmentHits(nil, r3.Vec{X: 50, Y: 50, Z: 1}, r3.Vec{X: 60, Y: 50, Z: 1}), nil},
		{"NaN segment", ix.AppendSegmentHits(nil, r3.Vec{X: math.NaN()}, r3.Vec{}), nil},
		{"Inf segment", ix.AppendSegmentHits(nil, r3.Vec{X: math.Inf(-1)}, r3.Vec{X: 3, Y: 0.5, Z: 0.5}), nil},
		{"near the poles exactly at the radius", ix.AppendNear(nil, orb.Point{8, 9}, 5), []int{0, 1}},
		{"near nothing", ix.AppendNear(nil, orb.Point{3, 3}, 1), nil},
		{"inside the block, radius 0", ix.AppendNear(nil, orb.Point{0.5, 0.5}, 0), []int{2}},
		{"everything, infinite radius", ix.AppendNear(nil, orb.Point{100, 100}, math.Inf(1)), []int{0, 1, 2}},
		{"negative radius", ix.AppendNear(nil, orb.Point{0.5, 0.5}, -1), nil},
		{"NaN radius", ix.AppendNear(nil, orb.Point{0.5, 0.5}, math.NaN()), nil},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if !slices.Equal(tt.got, tt.want) {
				t.Errorf("got %v, want %v", tt.got, tt.want)
			}
		})
	}
	if got := ix.Solid(2).Name; got != "block" {
		t.Errorf("Solid(2): got %q, want %q", got, "block")
	}
	solids[2].Name = "changed"
	if got := ix.Solid(2).Name; got != "block" {
		t.Errorf("after changing the caller's slice: got %q, want the copy %q", got, "block")
	}
	mustPanic(t, "NewIndex with a NaN footprint", func() {
		NewIndex([]Solid{{Footprint: Footprint{Center: orb.Point{math.NaN(), 0}}}})
	})
}

func TestIndexQueriesDoNotAllocate(t *testing.T) {
	rng := rand.New(rand.NewPCG(31, 32))
	ix := NewIndex(randomSolids(rng, 200, 30, 20))
	dst := make([]int, 0, 256)
	a, b := r3.Vec{X: 1, Y: 1, Z: 1.2}, r3.Vec{X: 29, Y: 19, Z: 1.5}
	if n := testing.AllocsPerRun(100, func() { dst = ix.AppendSegmentHits(dst[:0], a, b) }); n != 0 {
		t.Errorf("AppendSegmentHits with room in dst: got %g allocations, want 0", n)
	}
	if n := testing.AllocsPerRun(100, func() { dst = ix.AppendNear(dst[:0], orb.Point{15, 10}, 4) }); n != 0 {
		t.Errorf("AppendNear with room in dst: got %g allocations, want 0", n)
	}
}

func BenchmarkIndexAppendSegmentHits(b *testing.B) {
	// 200 solids on a 30 m × 20 m floor; sight lines from random stands at
	// 1–2 m to a nozzle at the centre, as the planner casts them.
	rng := rand.New(rand.NewPCG(41, 42))
	ix := NewIndex(randomSolids(rng, 200, 30, 20))
	const nq = 1024
	from := make([]r3.Vec, nq)
	for i := range from {
		from[i] = r3.Vec{X: 30 * rng.Float64(), Y: 20 * rng.Float64(), Z: 1 + rng.Float64()}
	}
	nozzle := r3.Vec{X: 15, Y: 10, Z: 1.5}
	dst := make([]int, 0, 256)
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; b.Loop(); i++ {
		dst = ix.AppendSegmentHits(dst[:0], from[i%nq], nozzle)
	}
}

func BenchmarkBruteSegmentHits(b *testing.B) {
	// The same queries without the index, for comparison.
	rng := rand.New(rand.NewPCG(41, 42))
	solids := randomSolids(rng, 200, 30, 20)
	const nq = 1024
	from := make([]r3.Vec, nq)
	for i := range from {
		from[i] = r3.Vec{X: 30 * rng.Float64(), Y: 20 * rng.Float64(), Z: 1 + rng.Float64()}
	}
	nozzle := r3.Vec{X: 15, Y: 10, Z: 1.5}
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; b.Loop(); i++ {
		for _, s := range solids {
			s.SegmentHits(from[i%nq], nozzle)
		}
	}
}

// TestAppendFirstSegmentHits: the first n hits other than skip are hits of
// the full query, distinct, at most n, and all of them when there are no
// more than n.
func TestAppendFirstSegmentHits(t *testing.T) {
	rng := rand.New(rand.NewPCG(41, 42))
	ix := NewIndex(randomSolids(rng, 300, 30, 20))
	for k := range 200 {
		a := r3.Vec{X: 30 * rng.Float64(), Y: 20 * rng.Float64(), Z: 2 * rng.Float64()}
		b := r3.Vec{X: 30 * rng.Float64(), Y: 20 * rng.Float64(), Z: 2 * rng.Float64()}
		all := ix.AppendSegmentHits(nil, a, b)
		skip := -1
		if len(all) > 0 {
			skip = all[rng.IntN(len(all))]
		}
		want := slices.DeleteFunc(slices.Clone(all), func(i int) bool { return i == skip })
		for _, n := range []int{1, 3, 1000} {
			got := ix.AppendFirstSegmentHits(nil, a, b, n, skip)
			if len(got) != min(n, len(want)) {
				t.Fatalf("segment %d, n %d: got %d hits %v, want %d of %v", k, n, len(got), got, min(n, len(want)), want)
			}
			seen := map[int]bool{}
			for _, i := range got {
				if seen[i] || !slices.Contains(want, i) {
					t.Fatalf("segment %d, n %d: got %v, want distinct hits from %v", k, n, got, want)
				}
				seen[i] = true
			}
		}
	}
}

// TestIndexCrowd: solids that all overlap one another (poles 20 mm across
// piled within 0.4 mm, or spread over 0.3 m, as an as-built file in the
// wrong unit or a pasted block of stations gives) are listed in a number of
// grid cells that grows linearly with the crowd, not as its square, and the
// queries still match brute force.
func TestIndexCrowd(t *testing.T) {
	rng := rand.New(rand.NewPCG(51, 52))
	for _, tc := range []struct {
		n      int
		spread float64
	}{{2000, 0.0004}, {2000, 0.3}, {300, 0}} {
		solids := make([]Solid, tc.n)
		for i := range solids {
			c := orb.Point{3 + tc.spread*rng.Float64(), 2 + tc.spread*rng.Float64()}
			solids[i] = Solid{Footprint: Circle(c, 0.01), ZMax: 1.5}
		}
		ix := NewIndex(solids)
		if len(ix.items) > maxCellsPerSolid*tc.n {
			t.Errorf("%d poles over %g m: listed %d times, want at most %d", tc.n, tc.spread, len(ix.items), maxCellsPerSolid*tc.n)
		}
		for range 200 {
			a := r3.Vec{X: 3 - 0.2 + 0.8*rng.Float64(), Y: 2 - 0.2 + 0.8*rng.Float64(), Z: 2 * rng.Float64()}
			b := r3.Vec{X: 10 * rng.Float64(), Y: 10 * rng.Float64(), Z: 2 * rng.Float64()}
			if got, want := ix.AppendSegmentHits(nil, a, b), bruteSegmentHits(solids, a, b); !slices.Equal(got, want) {
				t.Fatalf("%d poles over %g m, segment %v-%v: got %d hits, want %d", tc.n, tc.spread, a, b, len(got), len(want))
			}
			p, r := orb.Point{a.X, a.Y}, 0.3*rng.Float64()
			if got, want := ix.AppendNear(nil, p, r), bruteNear(solids, p, r); !slices.Equal(got, want) {
				t.Fatalf("%d poles over %g m, point %v radius %g: got %d, want %d", tc.n, tc.spread, p, r, len(got), len(want))
			}
		}
	}
}
