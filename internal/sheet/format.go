package sheet

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// printer formats numbers for the sheet in the layout's units.
type printer struct {
	sys  units.System
	conv planner.Convention
}

// metric reports whether lengths print in metres.
func (p printer) metric() bool { return p.sys == units.Metric }

// lenUnit is the unit heading of a length column: "m" or "ft-in".
func (p printer) lenUnit() string {
	if p.metric() {
		return "m"
	}
	return "ft-in"
}

// cell prints a length (m) for a table cell, without the unit in metric:
// "4.250"; in feet and inches as a tape reads (see [tape]).
func (p printer) cell(m float64) string {
	switch {
	case math.IsNaN(m):
		return "n/a"
	case math.IsInf(m, 1):
		return "none"
	case math.IsInf(m, -1):
		return "-inf"
	}
	if p.metric() {
		return fixed(m, 3)
	}
	return tape(m)
}

// length prints a length (m) with its unit: "4.250 m", or in feet and
// inches as a tape reads: 147' 7-5/8".
func (p printer) length(m float64) string {
	if p.metric() && finite(m) {
		return fixed(m, 3) + " m"
	}
	return p.cell(m)
}

// short prints a length (m) for a table of the plan's figures; the same
// notation as length, one notation in text and drawing.
func (p printer) short(m float64) string { return p.length(m) }

// dim prints a length (m) for a callout on the plan: as length, one
// notation in text and drawing (a site plan too: decimal feet such as
// 147.6' read as 147' 6" on site).
func (p printer) dim(m float64) string { return p.length(m) }

// tape prints a finite length (m) in feet and inches as a tape reads:
// units.FormatLength, the one imperial notation (147' 8", 7-7/8", 0").
func tape(m float64) string { return units.FormatLength(m, units.Imperial) }

// temp prints a temperature (K).
func (p printer) temp(k float64) string { return units.FormatTemperature(k, p.sys) }

// speed prints a velocity (m/s).
func (p printer) speed(v float64) string { return units.FormatVelocity(v, p.sys) }

// deg prints an angle (rad) in degrees with one decimal and no sign.
func deg(rad float64) string { return fixed(units.Deg(rad), 1) }

// degSign prints an angle (rad) as "30.0°".
func degSign(rad float64) string { return deg(rad) + "°" }

// roundDeg prints an angle (rad) in whole degrees when it is one within
// 0.05°, else with one decimal: "30°", "32.5°".
func roundDeg(rad float64) string {
	d := units.Deg(rad)
	if r := math.Round(d); math.Abs(d-r) < 0.05 {
		return fixed(r, 0) + "°"
	}
	return fixed(d, 1) + "°"
}

// polarHeading is the polar-angle column heading for the convention, in
// words the core fonts print.
func (p printer) polarHeading() string {
	if p.conv == planner.FromInlet {
		return "Polar (deg from inlet)"
	}
	return "Polar (deg from jet axis)"
}

// convention describes the polar-angle convention in words.
func (p printer) convention() string {
	if p.conv == planner.FromInlet {
		return "polar angle measured from the inlet (upstream) axis: 180° is downstream"
	}
	return "polar angle measured from the downstream jet axis: 0° is in the exhaust"
}

// fixed formats v with prec decimals, without a minus sign on a value that
// rounds to zero.
func fixed(v float64, prec int) string {
	s := strconv.FormatFloat(v, 'f', prec, 64)
	if strings.HasPrefix(s, "-") && strings.Trim(s[1:], "0.") == "" {
		return s[1:]
	}
	return s
}

// plural returns "1 station" or "3 stations".
func plural(n int, word string) string {
	if n == 1 {
		return "1 " + word
	}
	return fmt.Sprintf("%d %ss", n, word)
}

// unitsPressure prints a pressure (Pa) in the layout's units.
func unitsPressure(pa float64, p printer) string { return units.FormatPressure(pa, p.sys) }

// unitsFrequency prints a frequency (Hz).
func unitsFrequency(hz float64) string { return units.FormatFrequency(hz) }
