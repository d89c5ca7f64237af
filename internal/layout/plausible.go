package layout

import (
	"fmt"
	"math"
	"regexp"
	"strconv"

	"arcwright/internal/geometry"
	"arcwright/internal/units"
)

// Plausible inputs. A value outside these ranges parses, but no test of a
// jet in a cell or on a pad uses it: it is a slip (a unit, an exponent, a
// misplaced decimal point), and the models would be far outside their data
// or overflow. Decode refuses it with the range in the message, and the
// plume command refuses it on its flags. The bounds are our own choices,
// generous around the trade's practice (SUGGESTION; common practice where
// a fact of the trade is named).
const (
	// MaxNPR is the largest nozzle pressure ratio (total over ambient
	// pressure). Engine nozzles run below about 5 and model jets below
	// about 10 (common practice); 50 leaves room for rocket-like rigs.
	MaxNPR = 50.0
	// MinNPR is the smallest nozzle pressure ratio: 1.001. At NPR 1 there
	// is no flow; at 1.001 a jet at ambient temperature leaves at Mj ≈
	// 0.038, about 13 m/s (isentropic relations, DERIVED), a few times a
	// zone's velocity limit. Below it the jet is a draught, not a test
	// condition, and its predicted levels are meaningless (a jet of
	// 0.1 m/s at NPR 1.0000001 gave −172 dB).
	MinNPR = 1.001
	// MinTotalTemperature and MaxTotalTemperature bound a stream's total
	// temperature, K: from a cryogenically cooled model jet (−123 °C) to
	// above an afterburner's exhaust (about 2 000 K, common practice).
	MinTotalTemperature = 150.0
	MaxTotalTemperature = 3000.0
	// MinTemperatureRatio and MaxTemperatureRatio bound the total
	// temperature over the ambient temperature.
	MinTemperatureRatio = 0.5
	MaxTemperatureRatio = 12.0
	// MinGasConstant and MaxGasConstant bound the specific gas constant,
	// J/(kg K): from heavy gases (refrigerants, about 80) to helium
	// (2 077; from memory) with room to spare.
	MinGasConstant = 50.0
	MaxGasConstant = 5000.0
	// MinNozzleSize and MaxNozzleSize bound every dimension of a nozzle
	// exit (diameter, sides, secondary diameter), m: from a 1 mm
	// laboratory jet to a 10 m exhaust, above any engine's.
	MinNozzleSize = 1e-3
	MaxNozzleSize = 10.0
	// MaxDesignMach is the largest design Mach number of a
	// convergent-divergent nozzle (common practice: jet-noise rigs stay
	// below about 2.5).
	MaxDesignMach = 5.0
	// MaxAspectRatio is the largest aspect ratio of a rectangular exit.
	MaxAspectRatio = 100.0
	// MaxLength is the largest length or coordinate, m: 100 km from the
	// datum, the geometry package's bound.
	MaxLength = geometry.MaxCoord
	// MaxVelocityLimit is the largest velocity limit of a zone or of the
	// inflow, m/s: a zone's edge is a few m/s (common practice).
	MaxVelocityLimit = 100.0
	// MaxFarFieldRatio is the largest far_field_ratio (arc radius over jet
	// diameter); far-field arcs use 40 to 100 (common practice).
	MaxFarFieldRatio = 1000.0
	// MaxAbsorption is the largest absorption limit, dB.
	MaxAbsorption = 200.0
	// MinBand and MaxBand bound the band of interest, Hz: from infrasound
	// to beyond any measurement microphone's range (common practice).
	MinBand = 1.0
	MaxBand = 1e6
)

// Bounds of the file and its texts.
const (
	// MaxInputSize is the largest layout or as-built file read, bytes
	// (16 MiB): a layout of the largest arrays is a few hundred kB.
	MaxInputSize = 16 << 20
	// MaxNameLength is the longest name of an array, station, operating
	// point, stand, obstacle, keep-out zone or mark, in characters: names
	// go into station IDs, table cells and labels on the sheet.
	MaxNameLength = 40
	// MaxTextLength is the longest text of the title block, in characters.
	MaxTextLength = 120
	// MaxListProblems is how many problems of one kind a file reports
	// one by one before the rest are counted in one line.
	MaxListProblems = 20
)

// Range is the plausible interval of one input, in SI units, for the
// checks of layout values and command-line flags.
type Range struct {
	What     string  // the input in words: "nozzle pressure ratio"
	Min, Max float64 // bounds, SI; Min is excluded when MinOpen
	MinOpen  bool
	Unit     string // SI symbol printed after numbers; "" for a ratio
	// Show prints a value with its unit; nil prints it to four figures
	// followed by Unit.
	Show func(float64) string
}

// Plausible ranges of the jet inputs, shared by the layout and the plume
// command's flags.
var (
	NPRRange              = Range{What: "nozzle pressure ratio", Min: MinNPR, Max: MaxNPR}
	TotalTemperatureRange = Range{What: "total temperature", Min: MinTotalTemperature, Max: MaxTotalTemperature, Unit: "K"}
	TemperatureRatioRange = Range{What: "total-temperature ratio", Min: MinTemperatureRatio, Max: MaxTemperatureRatio}
	GammaRange            = Range{What: "ratio of specific heats", Min: 1, Max: 5.0 / 3, MinOpen: true}
	GasConstantRange      = Range{What: "gas constant", Min: MinGasConstant, Max: MaxGasConstant, Unit: "J/(kg K)"}
	NozzleSizeRange       = Range{What: "nozzle dimension", Min: MinNozzleSize, Max: MaxNozzleSize, Unit: "m", Show: MetricLength}
	DesignMachRange       = Range{What: "design Mach number", Min: 1, Max: MaxDesignMach, MinOpen: true}
	AspectRatioRange      = Range{What: "aspect ratio", Min: 1, Max: MaxAspectRatio}
	AmbientPressureRange  = Range{What: "ambient pressure", Min: MinPressure, Max: MaxPressure, Unit: "Pa", Show: kPa}
	AmbientTempRange      = Range{What: "ambient temperature", Min: MinTemperature, Max: MaxTemperature, Unit: "K"}
	VelocityLimitRange    = Range{What: "velocity limit", Min: 0, Max: MaxVelocityLimit, MinOpen: true, Unit: "m/s"}
	TempLimitRange        = Range{What: "temperature limit", Min: MinTemperature, Max: MaxTotalTemperature, Unit: "K"}
	DistanceRange         = Range{What: "distance", Min: 0, Max: MaxLength, Unit: "m", Show: MetricLength}
	BandRange             = Range{What: "frequency", Min: MinBand, Max: MaxBand, Unit: "Hz", Show: units.FormatFrequency}
)

// Contains reports whether v is finite and inside r. A closed bound
// includes the values that round to it: −60 °C (213.15 K by float
// arithmetic, 213.14999999999998) is inside a range from 213.15 K.
func (r Range) Contains(v float64) bool {
	if math.IsNaN(v) || math.IsInf(v, 0) || v > r.Max+edge(r.Max) {
		return false
	}
	if r.MinOpen {
		return v > r.Min
	}
	return v >= r.Min-edge(r.Min)
}

// edge is the rounding allowance at a range bound b: a few parts in 10¹²,
// far below any digit a user writes and above the error of a unit
// conversion.
func edge(b float64) float64 { return 1e-12 * math.Max(math.Abs(b), 1) }

// inside reports whether v is within [lo, hi], the bounds included with
// their rounding allowance.
func inside(v, lo, hi float64) bool { return v >= lo-edge(lo) && v <= hi+edge(hi) }

// decimalNumber matches a number as a user writes it: digits with an
// optional sign, decimal point and exponent; no hexadecimal, underscores,
// "Inf" or "NaN", which strconv.ParseFloat also reads.
var decimalNumber = regexp.MustCompile(`^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$`)

// ParseDecimal reads a plain decimal number as a user writes it (see
// decimalNumber), for the layout and the command-line flags.
func ParseDecimal(s string) (float64, error) {
	if !decimalNumber.MatchString(s) {
		return 0, fmt.Errorf("%q is not a decimal number", s)
	}
	return strconv.ParseFloat(s, 64)
}

// Want describes r for messages: "above 1 up to 50",
// "150 K to 3000 K (-123.1 °C to 2726.9 °C)".
func (r Range) Want() string {
	lo, hi := r.show(r.Min), r.show(r.Max)
	if r.MinOpen {
		return "above " + lo + " up to " + hi
	}
	w := lo + " to " + hi
	if r.Unit == "K" {
		w += " (" + tempC(r.Min) + " to " + tempC(r.Max) + ")"
	}
	return w
}

// show prints v as r's messages do.
func (r Range) show(v float64) string {
	if r.Show != nil && !math.IsNaN(v) && !math.IsInf(v, 0) {
		return r.Show(v)
	}
	return short(v) + r.unit()
}

// kPa prints a pressure, Pa, in kilopascals.
func kPa(p float64) string { return units.FormatPressure(p, units.Metric) }

// MetricLength prints a length of a range, m, to about three figures in
// metric units: "0 m", "50.8 mm", "4.11 m", "100 km".
func MetricLength(m float64) string {
	switch a := math.Abs(m); {
	case m == 0:
		return "0 m"
	case a >= 1000 && a < units.HugeValue:
		return short(m/1000) + " km"
	}
	return units.FormatLengthApprox(m, units.Metric)
}

// Check returns nil when v is inside r, else an error that names the input,
// the value (to four figures) and the range.
func (r Range) Check(v float64) error {
	if r.Contains(v) {
		return nil
	}
	return fmt.Errorf("the %s %s is implausible; want %s", r.What, r.show(v), r.Want())
}

func (r Range) unit() string {
	if r.Unit == "" {
		return ""
	}
	return " " + r.Unit
}

// short prints v to at most four significant figures, without a
// 300-digit expansion: 50, 1.86, 1e+305, NaN.
func short(v float64) string { return strconv.FormatFloat(v, 'g', 4, 64) }

// checkRange records a value of the layout outside r at n's line and field;
// shown is the value as the message prints it (in the layout's units), or
// "" for the SI value.
func (d *decoder) checkRange(line int, field string, r Range, v float64, shown string) bool {
	if r.Contains(v) {
		return true
	}
	if shown == "" {
		shown = r.show(v)
	}
	d.errorf(ErrInvalid, line, field, "the %s %s is implausible; want %s", r.What, shown, r.Want())
	return false
}

// fmtShort prints a length for a message about its range, to about three
// figures in the layout's units.
func (d *decoder) fmtShort(m float64) string {
	if a := math.Abs(m); a > 0 && a < 1e-3 && d.sys == units.Metric {
		return short(m*1e3) + " mm" // below the 0.1 mm of FormatLength
	}
	return units.FormatLengthApprox(m, d.sys)
}

// tempC prints a temperature range's bounds in °C as a hint.
func tempC(k float64) string { return units.FormatTemperature(k, units.Metric) }
