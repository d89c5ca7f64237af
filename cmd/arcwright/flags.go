package main

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"github.com/spf13/pflag"

	"arcwright/internal/layout"
	"arcwright/internal/units"
)

// quantityFlag is a flag holding a physical quantity. A bare number is in
// SI units (or in the unit named by bare).
type quantityFlag struct {
	dim   units.Dim
	bare  string
	value *float64
	text  string
	set   bool
	// doubt, when set, returns why a bare number is probably a slip (it
	// is read in SI units, and a diameter of "50.8" is 50.8 m), or "".
	doubt func(v float64) string
	// plausible, when set, is the range every value must lie in.
	plausible *layout.Range
	// unitRequired, when set, says why a bare number is refused: the
	// value must carry its unit (lengths only: the message suggests m and
	// ft).
	unitRequired string
}

func newQuantity(dim units.Dim, bare string, value *float64, def string) *quantityFlag {
	q := &quantityFlag{dim: dim, bare: bare, value: value, text: def}
	if def != "" {
		v, err := units.Parse(def, dim, bare)
		if err != nil {
			panic(err) // a default that does not parse is a programming error
		}
		*value = v
	}
	return q
}

func (q *quantityFlag) String() string { return q.text }
func (q *quantityFlag) Type() string   { return q.dim.String() }
func (q *quantityFlag) Set(s string) error {
	v, err := units.Parse(s, q.dim, q.bare)
	if err != nil {
		return err
	}
	if _, perr := strconv.ParseFloat(strings.TrimSpace(s), 64); perr == nil && q.unitRequired != "" {
		return fmt.Errorf("%q has no unit; give one, e.g. %sm or %sft (%s)", s, strings.TrimSpace(s), strings.TrimSpace(s), q.unitRequired)
	}
	if _, perr := strconv.ParseFloat(strings.TrimSpace(s), 64); perr == nil && q.doubt != nil {
		if why := q.doubt(v); why != "" {
			return fmt.Errorf("%q is read as %s, which is implausible here; give a unit, e.g. %s", s, why, q.example())
		}
	}
	if q.plausible != nil {
		if err := q.plausible.Check(v); err != nil {
			return err
		}
	}
	*q.value, q.text, q.set = v, s, true
	return nil
}

// example suggests a value with a unit for q's dimension.
func (q *quantityFlag) example() string {
	switch q.dim {
	case units.Length:
		return "50.8mm or 2in"
	case units.Temperature:
		return "15C or 800K"
	case units.Pressure:
		return "101.3kPa"
	case units.Fraction:
		return "70%"
	}
	return "a number with its unit"
}

// doubtful returns a doubt function for quantities outside [lo, hi] (SI),
// naming the value in the SI unit sym.
func doubtful(lo, hi float64, sym string) func(float64) string {
	return func(v float64) string {
		if v < lo || v > hi {
			return strconv.FormatFloat(v, 'g', 6, 64) + " " + sym + " (a bare number is in SI units)"
		}
		return ""
	}
}

// numberFlag is a flag holding a plain number (a ratio, a Mach number)
// that must be finite and inside a plausible range.
type numberFlag struct {
	value     *float64
	plausible layout.Range
	text      string
}

func newNumber(value *float64, def float64, r layout.Range) *numberFlag {
	*value = def
	return &numberFlag{value: value, plausible: r, text: strconv.FormatFloat(def, 'g', -1, 64)}
}

func (n *numberFlag) String() string { return n.text }
func (n *numberFlag) Type() string   { return "number" }
func (n *numberFlag) Set(s string) error {
	v, err := layout.ParseDecimal(strings.TrimSpace(s))
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return fmt.Errorf("want a finite number, the %s (%s), got %q", n.plausible.What, n.plausible.Want(), s)
	}
	if err := n.plausible.Check(v); err != nil {
		return err
	}
	*n.value, n.text = v, s
	return nil
}

// quantityList is a comma-separated list of quantities ("0.5m,1m,2 m").
type quantityList struct {
	dim       units.Dim
	values    *[]float64
	text      string
	plausible *layout.Range // when set, the range every value must lie in
}

func (l *quantityList) String() string { return l.text }
func (l *quantityList) Type() string   { return l.dim.String() + "s" }
func (l *quantityList) Set(s string) error {
	for _, part := range strings.Split(s, ",") {
		v, err := units.Parse(part, l.dim, "")
		if err != nil {
			return err
		}
		if l.plausible != nil {
			if err := l.plausible.Check(v); err != nil {
				return err
			}
		}
		*l.values = append(*l.values, v)
	}
	if l.text != "" {
		l.text += ","
	}
	l.text += s
	return nil
}

// choiceFlag is a flag that takes one of a few words.
type choiceFlag struct {
	value   *string
	choices []string
}

func newChoice(value *string, def string, choices ...string) *choiceFlag {
	*value = def
	return &choiceFlag{value: value, choices: choices}
}

func (c *choiceFlag) String() string { return *c.value }
func (c *choiceFlag) Type() string   { return strings.Join(c.choices, "|") }
func (c *choiceFlag) Set(s string) error {
	for _, ch := range c.choices {
		if s == ch {
			*c.value = s
			return nil
		}
	}
	return fmt.Errorf("want one of %s, got %q", strings.Join(c.choices, ", "), s)
}

// formatFlag adds the --format flag.
func formatFlag(fs *pflag.FlagSet, value *string, choices ...string) {
	fs.Var(newChoice(value, choices[0], choices...), "format", "output format: "+strings.Join(choices, ", "))
}

// unitsFlag adds the --units flag.
func unitsFlag(fs *pflag.FlagSet, value *string) {
	fs.Var(newChoice(value, "", "metric", "imperial"), "units", "units to print lengths and temperatures in, and the sheet's: metric or imperial (default: the layout's, else metric); a layout sheet.scale of the other family becomes the largest scale of this one not larger than it, with a note")
}
