package layout

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"go.yaml.in/yaml/v3"

	"arcwright/internal/units"
)

// quantity reads a scalar quantity of dimension dim; a bare number is in the
// unit bare ("" for SI). The result is SI.
func (d *decoder) quantity(n *yaml.Node, field string, dim units.Dim, bare string) (float64, bool) {
	s, ok := d.scalar(n, field, "a "+dim.String())
	if !ok {
		return 0, false
	}
	v, err := units.Parse(s, dim, bare)
	if err != nil {
		d.add(ErrInvalid, err, n.Line, field, err.Error())
		return 0, false
	}
	return v, true
}

// isBare reports whether s, which parses as dim in unit a, is a number
// without a unit: it parses to a different value when bare numbers are read
// in unit b instead. (A bare 0 is the same in both and is not caught.)
func isBare(s string, dim units.Dim, a, b string) bool {
	va, errA := units.Parse(s, dim, a)
	vb, errB := units.Parse(s, dim, b)
	return errA == nil && errB == nil && va != vb
}

// length reads a length, m; a bare number is in the layout's length unit.
// When that unit is unusable, a bare number gives no value and no further
// message (the unit was reported).
func (d *decoder) length(n *yaml.Node, field string) (float64, bool) {
	if d.lenBad && n.Kind == yaml.ScalarNode && isBare(n.Value, units.Length, "m", "mm") {
		return 0, false
	}
	v, ok := d.quantity(n, field, units.Length, d.lenUnit)
	if ok && math.Abs(v) > MaxLength {
		d.errorf(ErrInvalid, n.Line, field, "the length %s is implausible; want at most 100 km (a cell or a pad, from its datum)", d.fmtShort(v))
		return v, false
	}
	return v, ok
}

// positiveLength reads a length that must be greater than 0, m.
func (d *decoder) positiveLength(n *yaml.Node, field, what string) (float64, bool) {
	v, ok := d.length(n, field)
	if ok && v <= 0 {
		d.errorf(ErrInvalid, n.Line, field, "%s must be greater than 0, got %s", what, d.fmtLen(v))
		return v, false
	}
	return v, ok
}

// nonNegativeLength reads a length that must not be negative, m.
func (d *decoder) nonNegativeLength(n *yaml.Node, field, what string) (float64, bool) {
	v, ok := d.length(n, field)
	if ok && v < 0 {
		d.errorf(ErrInvalid, n.Line, field, "%s must not be negative, got %s", what, d.fmtLen(v))
		return v, false
	}
	return v, ok
}

// angle reads an angle, rad; a bare number is in degrees.
func (d *decoder) angle(n *yaml.Node, field string) (float64, bool) {
	return d.quantity(n, field, units.Angle, "deg")
}

// frequency reads a frequency, Hz; a bare number is in hertz.
func (d *decoder) frequency(n *yaml.Node, field string) (float64, bool) {
	return d.quantity(n, field, units.Frequency, "Hz")
}

// velocity reads a speed, m/s; a bare number is in metres per second.
func (d *decoder) velocity(n *yaml.Node, field string) (float64, bool) {
	return d.quantity(n, field, units.Velocity, "m/s")
}

// withUnit reads a quantity that must carry a unit (a temperature or a
// pressure), K or Pa. a and b are two units of dim used to tell a bare
// number; symbols are listed in the message.
func (d *decoder) withUnit(n *yaml.Node, field string, dim units.Dim, a, b, symbols string) (float64, bool) {
	s, ok := d.scalar(n, field, "a "+dim.String())
	if !ok {
		return 0, false
	}
	if isBare(s, dim, a, b) {
		d.errorf(ErrInvalid, n.Line, field, "want a %s with a unit (%s), got %q", dim, symbols, s)
		return 0, false
	}
	return d.quantity(n, field, dim, "")
}

// temperature reads an absolute temperature, K; a unit is required.
func (d *decoder) temperature(n *yaml.Node, field string) (float64, bool) {
	return d.withUnit(n, field, units.Temperature, "K", "C", "K, C or F")
}

// pressure reads a pressure, Pa; a unit is required.
func (d *decoder) pressure(n *yaml.Node, field string) (float64, bool) {
	return d.withUnit(n, field, units.Pressure, "Pa", "kPa", "kPa, hPa, mbar, bar, psi, inHg …")
}

// number reads a plain finite number; want describes it for messages
// ("a number, the nozzle pressure ratio").
func (d *decoder) number(n *yaml.Node, field, want string) (float64, bool) {
	s, ok := d.scalar(n, field, want)
	if !ok {
		return 0, false
	}
	v, err := ParseDecimal(strings.TrimSpace(s))
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		d.errorf(ErrInvalid, n.Line, field, "want %s, got %q", want, s)
		return 0, false
	}
	return v, true
}

// integer reads a whole number of at least lo.
func (d *decoder) integer(n *yaml.Node, field, want string, lo int) (int, bool) {
	s, ok := d.scalar(n, field, want)
	if !ok {
		return 0, false
	}
	v, err := strconv.Atoi(strings.TrimSpace(s))
	if err != nil || v < lo {
		d.errorf(ErrInvalid, n.Line, field, "want %s, got %q", want, s)
		return 0, false
	}
	return v, true
}

// text reads a string value; numbers and dates are kept as written.
func (d *decoder) text(n *yaml.Node, field string) (string, bool) {
	return d.scalar(n, field, "a text")
}

// choice reads one of the words in options.
func (d *decoder) choice(n *yaml.Node, field string, options []string) (string, bool) {
	s, ok := d.scalar(n, field, "one of "+oneOf(options))
	if !ok {
		return "", false
	}
	if contains(options, s) {
		return s, true
	}
	msg := fmt.Sprintf("want %s, got %q", oneOf(options), s)
	if g := suggest(s, options); g != "" {
		msg += fmt.Sprintf("; did you mean %q?", g)
	}
	d.add(ErrInvalid, nil, n.Line, field, msg)
	return "", false
}

// fmtLen prints a length, m, in the layout's sheet units for messages.
func (d *decoder) fmtLen(m float64) string { return units.FormatLength(m, d.sys) }

// suggestUnit looks for the slip behind an implausible quantity: it reads
// the number that starts s in each unit of candidates and returns the first
// rewriting (such as "101.3 kPa") whose SI value is plausible, or "".
func suggestUnit(s string, dim units.Dim, candidates []string, plausible func(float64) bool) string {
	t := strings.TrimSpace(s)
	end := 0
	for end < len(t) && strings.IndexByte("+-0123456789.eE", t[end]) >= 0 {
		end++
	}
	num := strings.TrimSpace(t[:end])
	written := strings.TrimSpace(t[end:])
	if _, err := strconv.ParseFloat(num, 64); err != nil {
		return ""
	}
	for _, c := range candidates {
		if c == written {
			continue
		}
		if v, err := units.Parse(num+" "+c, dim, ""); err == nil && plausible(v) {
			return num + " " + c
		}
	}
	return ""
}
