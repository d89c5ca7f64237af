package geometry

import (
	"errors"
	"fmt"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/planar"
)

// bruteSimple is the all-pairs simplicity check that checkSimple replaced:
// the reference its answers must equal.
func bruteSimple(r orb.Ring, n int) (int, int) {
	for i := range n {
		a, b := r[i], r[i+1]
		for j := i + 1; j < n; j++ {
			c, d := r[j], r[j+1]
			var bad bool
			switch {
			case !(j == i+1 || (i == 0 && j == n-1)):
				bad = segSegDist2(a, b, c, d) <= boundaryTol2
			case j == i+1:
				bad = planar.DistanceFromSegmentSquared(a, b, d) <= boundaryTol2 ||
					planar.DistanceFromSegmentSquared(c, d, a) <= boundaryTol2
			default:
				bad = planar.DistanceFromSegmentSquared(a, b, c) <= boundaryTol2 ||
					planar.DistanceFromSegmentSquared(c, d, b) <= boundaryTol2
			}
			if bad {
				return i, j
			}
		}
	}
	return -1, -1
}

// messyRing returns a closed ring of k random vertices in a 10 m square:
// almost always self-intersecting, often many times.
func messyRing(rng *rand.Rand, k int) orb.Ring {
	r := make(orb.Ring, 0, k+1)
	for range k {
		r = append(r, orb.Point{10 * rng.Float64(), 10 * rng.Float64()})
	}
	return append(r, r[0])
}

// TestPropertyCheckSimpleMatchesBrute: the indexed simplicity check names
// the same first pair of edges as comparing every pair, on simple stars,
// random tangles and stars with one vertex pulled across.
func TestPropertyCheckSimpleMatchesBrute(t *testing.T) {
	rng := rand.New(rand.NewPCG(21, 22))
	var rings []orb.Ring
	for range 100 {
		rings = append(rings, starRing(rng, orb.Point{}, 3+rng.IntN(200), 0.3, 5), messyRing(rng, 4+rng.IntN(60)))
		s := starRing(rng, orb.Point{}, 8+rng.IntN(100), 1, 5)
		k := rng.IntN(len(s) - 1)
		s[k] = orb.Point{-s[k][0] * rng.Float64(), -s[k][1] * rng.Float64()}
		s[len(s)-1] = s[0]
		rings = append(rings, s)
	}
	for ri, r := range rings {
		n := len(r) - 1
		wi, wj := bruteSimple(r, n)
		err := checkSimple(r, n)
		if wi < 0 {
			if err != nil {
				t.Fatalf("ring %d: got %v, want simple", ri, err)
			}
			continue
		}
		want := fmt.Sprintf("edge %d-%d from", wi+1, wi+2)
		wantJ := fmt.Sprintf("meets edge %d-%d from", wj+1, wj+2)
		if !errors.Is(err, ErrSelfIntersecting) || !containsAll(err.Error(), want, wantJ) {
			t.Fatalf("ring %d: got %v, want %s … %s", ri, err, want, wantJ)
		}
	}
}

func containsAll(s string, subs ...string) bool {
	for _, x := range subs {
		if !strings.Contains(s, x) {
			return false
		}
	}
	return true
}

// TestPropertyRingIndexMatchesBrute: the indexed distance, containment and
// crossing queries of a Cell give exactly the brute-force answers, for
// points and segments inside, outside, far away and on the boundary.
func TestPropertyRingIndexMatchesBrute(t *testing.T) {
	old := ringIndexMin
	ringIndexMin = 4
	defer func() { ringIndexMin = old }()
	rng := rand.New(rand.NewPCG(31, 32))
	for ri := range 60 {
		var r orb.Ring
		if ri%3 == 2 {
			r = messyRing(rng, 5+rng.IntN(80))
		} else {
			r = starRing(rng, orb.Point{3, -2}, 3+rng.IntN(400), 0.5+2*rng.Float64(), 6)
		}
		cell := Cell{Boundary: r}
		if cell.walls() == nil {
			t.Fatalf("ring %d: not indexed", ri)
		}
		pt := func() orb.Point {
			switch rng.IntN(4) {
			case 0: // a vertex or a point on an edge
				i := rng.IntN(len(r) - 1)
				f := rng.Float64()
				return orb.Point{r[i][0] + f*(r[i+1][0]-r[i][0]), r[i][1] + f*(r[i+1][1]-r[i][1])}
			case 1: // far away
				return orb.Point{-200 + 400*rng.Float64(), -200 + 400*rng.Float64()}
			}
			return orb.Point{3 - 8 + 16*rng.Float64(), -2 - 8 + 16*rng.Float64()}
		}
		for range 300 {
			p := pt()
			d2, in := cell.ringQuery(p)
			wd2, win := ringQuery(r, p)
			if d2 != wd2 || in != win {
				t.Fatalf("ring %d, p %v: got (%g, %v), want (%g, %v)", ri, p, d2, in, wd2, win)
			}
			if got, want := cell.walls().touches(p), wd2 <= boundaryTol2; got != want {
				t.Fatalf("ring %d, p %v: touches %v, want %v", ri, p, got, want)
			}
			a, b := pt(), pt()
			got := cell.walls().crossed(a, b)
			want := false
			for i := 0; i+1 < len(r); i++ {
				want = want || segmentsCross(a, b, r[i], r[i+1])
			}
			if got != want {
				t.Fatalf("ring %d, segment %v–%v: crossed %v, want %v", ri, a, b, got, want)
			}
		}
	}
}

// TestCellIndexFollowsBoundary: assigning a new boundary to a Cell that has
// indexed its old one answers for the new one.
func TestCellIndexFollowsBoundary(t *testing.T) {
	old := ringIndexMin
	ringIndexMin = 4
	defer func() { ringIndexMin = old }()
	c := Cell{Boundary: box(0, 0, 10, 10)}
	if !c.Contains(orb.Point{5, 5}) {
		t.Fatal("got (5, 5) outside the 10 m box, want inside")
	}
	c.Boundary = box(20, 20, 30, 30)
	if c.Contains(orb.Point{5, 5}) || !c.Contains(orb.Point{25, 25}) {
		t.Fatal("got the old boundary's answers after assigning a new one")
	}
}

// polygonRing returns a closed n-gon about the origin, about 100 m across
// with bays and points (radius 100 + 3 sin 5a + 0.5 sin 37a m) and 1 mm of
// survey noise (fixed seed): the short edges of a surveyed outline.
func polygonRing(n int) orb.Ring {
	rng := rand.New(rand.NewPCG(3, 4))
	r := make(orb.Ring, 0, n+1)
	for i := range n {
		a := 2 * math.Pi * float64(i) / float64(n)
		d := 100 + 3*math.Sin(5*a) + 0.5*math.Sin(37*a) + 0.001*rng.Float64()
		r = append(r, orb.Point{d * math.Cos(a), d * math.Sin(a)})
	}
	return append(r, r[0])
}

// BenchmarkCheckRing checks outlines of 1,000 to 50,000 vertices. The
// ns/vertex metric stays flat when the cost grows linearly (it grew with
// the number of vertices when every pair of edges was compared: 19 s for
// 20,000).
func BenchmarkCheckRing(b *testing.B) {
	for _, n := range []int{1000, 5000, 20000, 50000} {
		b.Run(fmt.Sprintf("vertices=%d", n), func(b *testing.B) {
			r := polygonRing(n)
			b.ReportAllocs()
			for b.Loop() {
				if err := CheckRing(r); err != nil {
					b.Fatal(err)
				}
			}
			b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/float64(n), "ns/vertex")
		})
	}
}

// BenchmarkCellQueries makes 1,000 distance, containment and sight-line
// queries of a cell whose surveyed boundary has 1,000 to 50,000 vertices.
// The ns/query metric stays about flat (a query's cost grows as the
// logarithm of the number of vertices). A smooth round room is slower:
// many edges are about as near as the nearest, and WallDistance looks at
// all of those (about the square root of the number of vertices of them).
func BenchmarkCellQueries(b *testing.B) {
	for _, n := range []int{1000, 5000, 20000, 50000} {
		b.Run(fmt.Sprintf("vertices=%d", n), func(b *testing.B) {
			c := Cell{Boundary: polygonRing(n)}
			rng := rand.New(rand.NewPCG(5, 6))
			pts := make([]orb.Point, 1000)
			for i := range pts {
				// stations fill the room but for a 10 m circle about its
				// centre, where every edge is about equally near
				a, d := 2*math.Pi*rng.Float64(), 10+110*rng.Float64()
				pts[i] = orb.Point{d * math.Cos(a), d * math.Sin(a)}
			}
			b.ReportAllocs()
			for b.Loop() {
				for i, p := range pts {
					_ = c.WallDistance(p)
					_ = c.SegmentInside(pts[(i+7)%len(pts)], p)
					_ = c.Contains(pts[(i+1)%len(pts)])
				}
			}
			b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/float64(len(pts)), "ns/query")
		})
	}
}
