package sheet

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"arcwright/internal/units"
)

// metricScales are the scale denominators a metric sheet chooses from,
// largest drawing first: the ISO 5455:1979 recommended scales 1:1, 1:2, 1:5
// and their decades up to 1:5000 (acoustics.md §8.4, FROM MEMORY), with
// 1:25 and 1:75, which drawing offices use for building plans (common
// practice). 1:500 to 1:5000 serve outdoor sites.
var metricScales = []int{1, 2, 5, 10, 20, 25, 50, 75, 100, 200, 500, 1000, 2000, 5000}

// imperialScale is a scale of a feet-and-inches sheet: its denominator and
// how a drawing office writes it.
type imperialScale struct {
	den  int
	name string
}

// imperialScales are the scales a feet-and-inches sheet chooses from,
// largest drawing first: the architect's scales (3″ = 1′-0″ is 1:4 …
// 1/8″ = 1′-0″ is 1:96) for rooms and the engineer's scales (1″ = 10′ is
// 1:120 … 1″ = 500′ is 1:6000) for sites; the denominator is the feet
// per inch times 12 (common practice; hand-computed denominators).
var imperialScales = []imperialScale{
	{4, `3" = 1'-0"`}, {8, `1-1/2" = 1'-0"`}, {12, `1" = 1'-0"`}, {16, `3/4" = 1'-0"`},
	{24, `1/2" = 1'-0"`}, {32, `3/8" = 1'-0"`}, {48, `1/4" = 1'-0"`}, {64, `3/16" = 1'-0"`},
	{96, `1/8" = 1'-0"`},
	{120, `1" = 10'`}, {240, `1" = 20'`}, {360, `1" = 30'`}, {480, `1" = 40'`}, {600, `1" = 50'`},
	{720, `1" = 60'`}, {1200, `1" = 100'`}, {2400, `1" = 200'`}, {3600, `1" = 300'`},
	{4800, `1" = 400'`}, {6000, `1" = 500'`},
}

// scalesFor returns the denominators the sheet chooses from in the unit
// system sys, largest drawing first.
func scalesFor(sys units.System) []int {
	if sys == units.Imperial {
		out := make([]int, len(imperialScales))
		for i, s := range imperialScales {
			out[i] = s.den
		}
		return out
	}
	return append([]int(nil), metricScales...)
}

// StandardScales returns every scale denominator the sheet accepts: the
// metric ones, then the feet-and-inches ones, each largest drawing first.
func StandardScales() []int { return append(scalesFor(units.Metric), scalesFor(units.Imperial)...) }

// isStandard reports whether 1:den is one of [StandardScales].
func isStandard(den int) bool {
	for _, s := range StandardScales() {
		if s == den {
			return true
		}
	}
	return false
}

// ScaleName prints the scale 1:den as a drawing office of the unit system
// writes it: "1:50", or `1" = 20' (1:240)` for a feet-and-inches scale on
// an imperial sheet.
func ScaleName(den int, sys units.System) string {
	if sys == units.Imperial {
		for _, s := range imperialScales {
			if s.den == den {
				return s.name + " (1:" + strconv.Itoa(den) + ")"
			}
		}
	}
	return "1:" + strconv.Itoa(den)
}

// ScaleNames lists the accepted scales for messages and help.
func ScaleNames() string {
	return ScaleNamesFor(units.Metric) + "; on feet-and-inches sheets also " + ScaleNamesFor(units.Imperial)
}

// ScaleNamesFor lists the scales of one unit system's sheets, as its
// drawing offices write them: "1:1, 1:2, …, 1:5000", or the architect's
// scales 3", … 1/8" = 1'-0" and the engineer's 1" = 10', … 500'.
func ScaleNamesFor(sys units.System) string {
	if sys != units.Imperial {
		var m []string
		for _, s := range metricScales {
			m = append(m, "1:"+strconv.Itoa(s))
		}
		return strings.Join(m, ", ")
	}
	var arch, eng []string
	for _, s := range imperialScales {
		if s.den < 120 {
			arch = append(arch, strings.TrimSuffix(s.name, ` = 1'-0"`))
		} else {
			eng = append(eng, strings.TrimPrefix(s.name, `1" = `))
		}
	}
	return strings.Join(arch, ", ") + ` = 1'-0" and 1" = ` + strings.Join(eng, ", ")
}

// CheckScale reports whether 1:den is a standard scale of the family of a
// sheet in unit system sys: a sheet keeps one family, so that its plan, its
// elevation and its details are all read with the same rule (a
// feet-and-inches scale on a metric sheet would print as an odd metric one,
// 1" = 20' as 1:240; a metric one on a feet-and-inches sheet would leave the
// elevation on an engineer's scale). The error wraps [ErrScale] and names
// the scales of the sheet's family.
func CheckScale(den int, sys units.System) error {
	if !isStandard(den) {
		return fmt.Errorf("%w: 1:%d is not a standard scale: want one of %s", ErrScale, den, ScaleNames())
	}
	if r := otherFamily(den, sys); r != "" {
		return fmt.Errorf("%w: %s", ErrScale, r)
	}
	return nil
}

// otherFamily says why the standard scale 1:den is not of the family of a
// sheet in unit system sys, "" when it is.
func otherFamily(den int, sys units.System) string {
	for _, s := range scalesFor(sys) {
		if s == den {
			return ""
		}
	}
	if sys == units.Imperial {
		return fmt.Sprintf("1:%d is a metric scale, and this is a feet-and-inches sheet: one family of scales per sheet; want one of %s", den, ScaleNamesFor(units.Imperial))
	}
	return fmt.Sprintf("%s is a feet-and-inches scale, and this is a metric sheet: one family of scales per sheet; want one of %s", ScaleName(den, units.Imperial), ScaleNamesFor(units.Metric))
}

// scaleKey normalises a written scale for comparison: no spaces, inches
// and feet as " and ', no trailing -0".
func scaleKey(s string) string {
	s = strings.ToLower(strings.Join(strings.Fields(s), ""))
	for _, r := range []struct{ from, to string }{
		{"″", `"`}, {"′", "'"}, {"inches", `"`}, {"inch", `"`}, {"in", `"`},
		{"feet", "'"}, {"foot", "'"}, {"ft", "'"}, {"''", `"`},
	} {
		s = strings.ReplaceAll(s, r.from, r.to)
	}
	return strings.TrimSuffix(strings.TrimSuffix(s, `-0"`), `0"`)
}

// ParseScale reads a scale as a user writes it: "1:50", "50", or a
// feet-and-inches scale such as `1" = 20'`, `1in=20ft` or `1/4" = 1'-0"`.
// It returns the denominator, one of [StandardScales]; the error wraps
// [ErrScale] and lists the scales.
func ParseScale(s string) (int, error) {
	t := strings.TrimSpace(s)
	if n, err := strconv.Atoi(strings.TrimPrefix(strings.ReplaceAll(t, " ", ""), "1:")); err == nil {
		if isStandard(n) {
			return n, nil
		}
		return 0, fmt.Errorf("%w: %q is not a standard scale: want one of %s", ErrScale, t, ScaleNames())
	}
	k := scaleKey(t)
	for _, sc := range imperialScales {
		if scaleKey(sc.name) == k {
			return sc.den, nil
		}
	}
	return 0, fmt.Errorf("%w: %q is not a scale: want one of %s", ErrScale, t, ScaleNames())
}

// fits reports whether a world extent of w × h metres fits a drawing area
// of aw × ah millimetres at 1:scale.
func fits(w, h, aw, ah float64, scale int) bool {
	k := 1000 / float64(scale)
	return w*k <= aw && h*k <= ah
}

// chooseScale returns the largest scale of the list (smallest denominator)
// at which a w × h m extent fits an aw × ah mm area, and false if none
// does.
func chooseScale(list []int, w, h, aw, ah float64) (int, bool) {
	for _, s := range list {
		if fits(w, h, aw, ah, s) {
			return s, true
		}
	}
	return 0, false
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
	r := math.Round(v*1e6) / 1e6
	if r == 0 {
		r = 0 // no "-0"
	}
	return strconv.FormatFloat(r, 'f', -1, 64)
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
