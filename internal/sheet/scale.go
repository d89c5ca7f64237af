package sheet

import (
	"fmt"
	"math"
	"strconv"

	"arcwright/internal/units"
)

// standardScales are the scale denominators the sheet chooses from, largest
// drawing first: the ISO 5455:1979 recommended reduction scales 1:10, 1:20,
// 1:50, 1:100, 1:200, 1:500, 1:1000 and 1:2000 (acoustics.md §8.4, FROM
// MEMORY), with 1:25, common on building plans (common practice). The last
// three serve outdoor pads.
var standardScales = []int{10, 20, 25, 50, 100, 200, 500, 1000, 2000}

// StandardScales returns the scale denominators Build chooses from, largest
// drawing first.
func StandardScales() []int { return append([]int(nil), standardScales...) }

// fits reports whether a world extent of w × h metres fits a drawing area
// of aw × ah millimetres at 1:scale.
func fits(w, h, aw, ah float64, scale int) bool {
	k := 1000 / float64(scale)
	return w*k <= aw && h*k <= ah
}

// chooseScale returns the largest standard scale (smallest denominator) at
// which a w × h m extent fits an aw × ah mm area, and false if none does.
func chooseScale(w, h, aw, ah float64) (int, bool) {
	for _, s := range standardScales {
		if fits(w, h, aw, ah, s) {
			return s, true
		}
	}
	return 0, false
}

// scaleFor returns the plan's scale: the one asked for (asked > 0) when it
// fits, or the largest standard scale that fits. field names the option
// that asked, for the error.
func scaleFor(asked int, field string, w, h, aw, ah float64, paper string) (int, error) {
	best, ok := chooseScale(w, h, aw, ah)
	if asked > 0 {
		if fits(w, h, aw, ah, asked) {
			return asked, nil
		}
		if ok {
			return 0, fmt.Errorf("%w: %s asks for 1:%d, but the plan (%.1f × %.1f m) does not fit the drawing area on %s at it; 1:%d would",
				ErrScale, field, asked, w, h, paper, best)
		}
		return 0, fmt.Errorf("%w: %s asks for 1:%d, but the plan (%.1f × %.1f m) does not fit the drawing area on %s at it nor at 1:%d; a larger paper is needed",
			ErrScale, field, asked, w, h, paper, standardScales[len(standardScales)-1])
	}
	if !ok {
		return 0, fmt.Errorf("%w: the plan (%.1f × %.1f m) does not fit the drawing area on %s even at 1:%d; use a larger paper",
			ErrScale, w, h, paper, standardScales[len(standardScales)-1])
	}
	return best, nil
}

// niceSteps are the round steps for grids and scale bars, as multiples of a
// power of ten.
var niceSteps = []float64{1, 2, 2.5, 5}

// niceAbove returns the smallest round number (1, 2, 2.5 or 5 times a power
// of ten) at least v (> 0).
func niceAbove(v float64) float64 {
	e := math.Floor(math.Log10(v))
	for {
		p := math.Pow(10, e)
		for _, s := range niceSteps {
			if s*p >= v*(1-1e-12) {
				return s * p
			}
		}
		e++
	}
}

// unitLen is the length of one printing unit of the layout's system, m: the
// metre or the international foot (0.3048 m, units.Foot).
func unitLen(sys units.System) float64 {
	if sys == units.Imperial {
		return units.Foot
	}
	return 1
}

// unitSym is the symbol of the printing unit: "m" or "ft".
func unitSym(sys units.System) string {
	if sys == units.Imperial {
		return "ft"
	}
	return "m"
}

// gridSpacing returns the grid spacing, m, a round number of the layout's
// unit that is at least minMM millimetres on the page at 1:scale.
func gridSpacing(scale int, sys units.System, minMM float64) float64 {
	u := unitLen(sys)
	need := minMM * float64(scale) / 1000 / u // in printing units
	return niceAbove(need) * u
}

// trimNum prints v (a count of printing units) without trailing zeros:
// "2", "2.5", "0.25".
func trimNum(v float64) string {
	return strconv.FormatFloat(math.Round(v*1e6)/1e6, 'f', -1, 64)
}

// scaleBarFor returns the scale bar for 1:scale: a round length of the
// layout's unit whose drawn length is the largest not above maxMM (and at
// least a tenth of it), divided into 4 or 5 round parts.
func scaleBarFor(scale int, sys units.System, maxMM float64) ScaleBar {
	u := unitLen(sys)
	k := 1000 / float64(scale)
	real := niceAbove(maxMM / k / u) // units
	for real*u*k > maxMM {
		real = niceBelow(real * (1 - 1e-9))
	}
	div := 5
	lead := real / math.Pow(10, math.Floor(math.Log10(real)))
	if math.Abs(lead-2) < 1e-9 {
		div = 4
	}
	bar := ScaleBar{RealLength: real * u, LengthMM: real * u * k, Divisions: div}
	for i := 0; i <= div; i++ {
		bar.Ticks = append(bar.Ticks, trimNum(real*float64(i)/float64(div)))
	}
	bar.Label = trimNum(real) + " " + unitSym(sys)
	return bar
}

// niceBelow returns the largest round number at most v (> 0).
func niceBelow(v float64) float64 {
	e := math.Floor(math.Log10(v))
	for {
		p := math.Pow(10, e)
		for i := len(niceSteps) - 1; i >= 0; i-- {
			if niceSteps[i]*p <= v*(1+1e-12) {
				return niceSteps[i] * p
			}
		}
		e--
	}
}
