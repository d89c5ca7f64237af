package planner

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/spatial/r3"
)

// asBuiltTolerance is how far, m, a measured microphone or stand base may
// be from where the plan or the stand's arm puts it before the as-built
// check says so: about the accuracy of marking out a floor with a tape
// (common practice; SUGGESTION).
const asBuiltTolerance = 0.01

// asBuilt compares a station's measured position with the plan, the
// microphone and the stand base separately; ok is false when no as-built
// positions were given. A station the as-built positions leave out is
// listed as not measured (a warning: its planned position was checked, not
// where it stands). A microphone moved without a measured base is flagged,
// since its base was only assumed to move with it, and so is a measured
// base whose arm to the microphone is not the stand's.
func (ck *checker) asBuilt(st *Station) (Check, bool) {
	if ck.req.AsBuilt == nil {
		return Check{}, false
	}
	c := Check{Name: CheckAsBuilt, Value: math.NaN(), Unit: "m", Verdict: OK}
	if st.Measurement != Measured {
		c.Verdict = Warn
		c.Reason = "not in the as-built file: not measured; checked at its planned place only"
		return c, true
	}
	mic := r3.Norm(r3.Sub(st.Mic, *st.Planned))
	c.Value = mic
	if st.Stand == nil {
		c.Reason = fmt.Sprintf("as built: %s from its planned place", ck.m(mic))
		return c, true
	}
	base := math.Hypot(st.Base[0]-st.PlannedBase[0], st.Base[1]-st.PlannedBase[1])
	armPlan := math.Hypot(st.Planned.X-st.PlannedBase[0], st.Planned.Y-st.PlannedBase[1])
	armBuilt := math.Hypot(st.Mic.X-st.Base[0], st.Mic.Y-st.Base[1])
	switch {
	case !st.BaseMeasured && mic > asBuiltTolerance:
		c.Verdict = Warn
		c.Reason = fmt.Sprintf("the microphone is %s from its planned place, but the as-built file gives no base_x, base_y: its stand's base was taken to have moved with it; measure the base too", ck.m(mic))
	case st.BaseMeasured && math.Abs(armBuilt-armPlan) > asBuiltTolerance:
		c.Verdict = Warn
		c.Reason = fmt.Sprintf("the microphone is %s and the base %s from their planned places: the arm between them is %s in plan, the stand's %s; one moved without the other: check both", ck.m(mic), ck.m(base), ck.m(armBuilt), ck.m(armPlan))
	case st.BaseMeasured:
		c.Reason = fmt.Sprintf("as built: microphone %s, base %s from their planned places", ck.m(mic), ck.m(base))
	default:
		c.Reason = fmt.Sprintf("as built: microphone %s from its planned place (base not measured)", ck.m(mic))
	}
	return c, true
}
