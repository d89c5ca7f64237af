package geometry

import (
	"fmt"
	"math"

	"github.com/paulmach/orb"
)

// StandBaseHeight is the height, m, assumed for the base (feet, tripod legs
// or weighted plate) of a microphone stand: the base occupies a disc at floor
// level from z = 0 to z = StandBaseHeight. 0.1 m covers the common tripod
// and plate bases (common practice, not from a standard).
const StandBaseHeight = 0.1

// PoleClearance holds the clearances of one stand from the cell, m. Each is
// the smallest over the stand's pole and base; a negative value means the
// stand crosses or overlaps the thing by that much in plan.
type PoleClearance struct {
	// Wall is the smallest plan distance from the pole or base to the
	// boundary: positive inside, negative when the stand crosses it or
	// stands outside. +Inf when the cell is unbounded.
	Wall float64
	// Obstacle is the smallest 3-D clearance to an obstacle whose height
	// range overlaps [0, top]; ObstacleName names it. +Inf and "" when no
	// obstacle qualifies.
	Obstacle     float64
	ObstacleName string
	// KeepOut is the smallest plan distance to a keep-out zone, negative when
	// the stand stands in it; KeepOutName names it. +Inf and "" when there
	// are none.
	KeepOut     float64
	KeepOutName string
}

// PoleClearance returns the clearances of a stand at plan point p (m): a
// vertical pole of radius poleR (m) from the floor to height top (m), on a
// base of radius baseR (m) that occupies z in [0, StandBaseHeight].
//
// In plan the stand is a disc of radius max(poleR, baseR) about p; Wall and
// KeepOut are the signed distances from that disc. For each obstacle whose
// height range [ZMin, ZMax] overlaps [0, top] (touching counts), the
// clearance is the smaller of the pole's and the base's: for a part of plan
// radius ρ and height range overlapping the obstacle's it is the signed plan
// distance d − ρ from the part to the footprint (d is
// [Footprint.Distance] at p); for the base under an obstacle that starts
// higher than StandBaseHeight it is the 3-D distance
// sqrt(max(d − ρ, 0)² + (ZMin − StandBaseHeight)²). Obstacles entirely
// above top are left out, as the sight lines from the microphone are
// checked separately. Ties go to the first in the list.
//
// Every field is NaN (and the names empty) if p has a NaN coordinate.
// PoleClearance panics if top, poleR or baseR is negative, NaN or infinite
// (programmer misuse: the stand's size is checked when it is read).
func (c *Cell) PoleClearance(p orb.Point, top, poleR, baseR float64) PoleClearance {
	for _, v := range [...]float64{top, poleR, baseR} {
		if !finite(v) || v < 0 {
			panic(fmt.Sprintf("geometry: PoleClearance(top %g m, poleR %g m, baseR %g m) needs finite sizes >= 0", top, poleR, baseR))
		}
	}
	if isNaNPoint(p) {
		nan := math.NaN()
		return PoleClearance{Wall: nan, Obstacle: nan, KeepOut: nan}
	}
	reach := math.Max(poleR, baseR)
	pc := PoleClearance{
		Wall:     c.WallDistance(p) - reach,
		Obstacle: math.Inf(1),
		KeepOut:  math.Inf(1),
	}
	for _, o := range c.Obstacles {
		if o.ZMax < 0 || o.ZMin > top {
			continue
		}
		// The pole spans [0, top], so it overlaps the obstacle in height and
		// its clearance is the plan one. Every part's clearance is at least
		// d − reach, and d is at least the distance to the footprint's
		// bounding rectangle, which skips obstacles that cannot beat the
		// best so far.
		if bd := boundDist2(o.Footprint.Bound(), p); bd > 0 && math.Sqrt(bd)-reach >= pc.Obstacle {
			continue
		}
		d := o.Footprint.Distance(p)
		cl := d - poleR
		base := d - baseR
		if gap := o.ZMin - StandBaseHeight; gap > 0 {
			base = math.Hypot(math.Max(base, 0), gap)
		}
		cl = math.Min(cl, base)
		if cl < pc.Obstacle {
			pc.Obstacle, pc.ObstacleName = cl, o.Name
		}
	}
	for _, k := range c.KeepOuts {
		if d := k.Footprint.Distance(p) - reach; d < pc.KeepOut {
			pc.KeepOut, pc.KeepOutName = d, k.Name
		}
	}
	return pc
}
