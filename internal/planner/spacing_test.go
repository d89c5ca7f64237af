package planner

import (
	"fmt"
	"math"
	"math/rand/v2"
	"testing"

	"github.com/paulmach/orb"

	"arcwright/internal/geometry"
)

// bruteSpread is the spacing search as it was before the tree: every stand
// whose sight-line solid comes within reach, in index order.
func bruteSpread(feet []foot, sight []float64, i int, maxFoot, spacing float64) spread {
	s := spread{best: math.Inf(1), who: -1}
	me := feet[i]
	reach := me.r + maxFoot + spacing
	for j, o := range feet {
		if j == i || geometry.Circle(o.at, sight[j]).Distance(me.at) > reach {
			continue
		}
		g := math.Hypot(o.at[0]-me.at[0], o.at[1]-me.at[1]) - me.r - o.r
		if g < s.best {
			s.best, s.who = g, j
		}
		switch {
		case g < 0:
			s.overlaps++
		case g < spacing:
			s.close++
		}
	}
	return s
}

// verdictOf is the spacing verdict a spread gives.
func verdictOf(s spread, spacing float64) Verdict {
	switch {
	case s.best < 0:
		return Blocked
	case s.best < spacing:
		return Warn
	}
	return OK
}

// randomStands returns n stands of the given base radii (m; some random
// radii as well when mixed) at random places: spread over a square side
// metres across, or on a lattice of pitch metres so that many gaps tie
// exactly and some stands stand on the same spot.
func randomStands(rng *rand.Rand, n int, side, pitch float64, sizes []float64, mixed bool) (feet []foot, sight []float64, maxFoot float64) {
	for range n {
		var at orb.Point
		if pitch > 0 {
			k := int(side / pitch)
			at = orb.Point{10 + pitch*float64(rng.IntN(k+1)), 10 + pitch*float64(rng.IntN(k+1))}
		} else {
			at = orb.Point{10 + side*rng.Float64(), 10 + side*rng.Float64()}
		}
		r := sizes[rng.IntN(len(sizes))]
		if mixed && rng.IntN(4) == 0 {
			r = 0.01 + rng.Float64()
		}
		sr := r // a flush microphone is its own sight-line solid
		if r != flushRadius {
			sr = 0.005 + 0.03*rng.Float64()
		}
		feet = append(feet, foot{at: at, r: r})
		sight = append(sight, sr)
		maxFoot = math.Max(maxFoot, r)
	}
	return feet, sight, maxFoot
}

// TestSpreadMatchesBrute compares the tree search with a scan of every
// stand over random layouts of mixed stand sizes: the same verdict, the
// same deepest-overlap (or nearest) stand and gap, the exact counts below
// the cap and "more than the cap" above it.
func TestSpreadMatchesBrute(t *testing.T) {
	rng := rand.New(rand.NewPCG(12, 10))
	layouts := 0
	sizes := []struct {
		r     []float64
		mixed bool
	}{
		// flush microphones, posts, tripods, a few wide bases, and random
		{[]float64{flushRadius, 0.05, 0.12, 0.2, 0.2, 0.6, 2}, true},
		{[]float64{0.2}, false},
		{[]float64{0.05, 0.2}, false},
	}
	for _, side := range []float64{0.3, 2, 8, 40} {
		for _, pitch := range []float64{0, 0.05, 0.25} {
			for _, spacing := range []float64{0, 0.1, 0.5} {
				for k := range 6 {
					n := 1 + rng.IntN(400)
					sz := sizes[k%len(sizes)]
					feet, sight, maxFoot := randomStands(rng, n, side, pitch, sz.r, sz.mixed)
					layouts++
					compareSpread(t, feet, sight, maxFoot, spacing, fmt.Sprintf("side %g m, pitch %g m, spacing %g m, %d stands", side, pitch, spacing, n))
				}
			}
		}
	}
	// around a post, one flush microphone 10 mm clear of its base and m−1
	// in a ring 0.25 m clear (overlapping one another): the post has m
	// stands too close and none overlapping, a count that crosses the cap
	// while the nearest is found first
	for _, m := range []int{2, spacingCap - 1, spacingCap, spacingCap + 1, spacingCap + 2, 3 * spacingCap} {
		feet := []foot{{at: orb.Point{5, 5}, r: 0.2}, {at: orb.Point{5, 5.2 + flushRadius + 0.01}, r: flushRadius}}
		sight := []float64{0.01, flushRadius}
		for k := range m - 1 {
			a := 2 * math.Pi * float64(k) / float64(m-1)
			d := 0.2 + flushRadius + 0.25
			feet = append(feet, foot{at: orb.Point{5 + d*math.Cos(a), 5 + d*math.Sin(a)}, r: flushRadius})
			sight = append(sight, flushRadius)
		}
		layouts++
		compareSpread(t, feet, sight, 0.2, 0.5, fmt.Sprintf("a ring of %d", m))
		if s := newStandTreeLeaf(feet, sight, 1).near(0, 0.2, 0.5); s.overlaps != 0 || !sameCount(s.close, m) {
			t.Errorf("a ring of %d: the post has %d overlaps and %d too close", m, s.overlaps, s.close)
		}
	}
	t.Logf("%d layouts", layouts)
}

// compareSpread compares the tree search of every stand with brute force,
// with leaves of one stand (where every stop is tried) and of spacingLeaf.
func compareSpread(t *testing.T, feet []foot, sight []float64, maxFoot, spacing float64, layout string) {
	t.Helper()
	for _, leaf := range []int{1, spacingLeaf} {
		compareSpreadLeaf(t, newStandTreeLeaf(feet, sight, leaf), feet, sight, maxFoot, spacing, fmt.Sprintf("%s, leaves of %d", layout, leaf))
	}
}

// compareSpreadLeaf compares tree with brute force for every stand.
func compareSpreadLeaf(t *testing.T, tree *standTree, feet []foot, sight []float64, maxFoot, spacing float64, layout string) {
	t.Helper()
	for i := range feet {
		got := tree.near(i, maxFoot, spacing)
		want := bruteSpread(feet, sight, i, maxFoot, spacing)
		where := fmt.Sprintf("%s, stand %d", layout, i)
		if verdictOf(got, spacing) != verdictOf(want, spacing) {
			t.Fatalf("%s: verdict %v, brute force %v", where, verdictOf(got, spacing), verdictOf(want, spacing))
		}
		if got.who != want.who || got.best != want.best {
			t.Fatalf("%s: stand %d at %g m, brute force %d at %g m", where, got.who, got.best, want.who, want.best)
		}
		if !sameCount(got.overlaps, want.overlaps) {
			t.Fatalf("%s: %d overlaps, brute force %d", where, got.overlaps, want.overlaps)
		}
		if want.overlaps == 0 && !sameCount(got.close, want.close) {
			t.Fatalf("%s: %d too close, brute force %d", where, got.close, want.close)
		}
	}
}

// sameCount reports whether a capped count agrees with an exact one.
func sameCount(capped, exact int) bool {
	if exact > spacingCap {
		return capped > spacingCap
	}
	return capped == exact
}
