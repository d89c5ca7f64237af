package main

import (
	"fmt"
	"strings"

	"github.com/spf13/pflag"

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
	*q.value, q.text, q.set = v, s, true
	return nil
}

// quantityList is a comma-separated list of quantities ("0.5m,1m,2 m").
type quantityList struct {
	dim    units.Dim
	values *[]float64
	text   string
}

func (l *quantityList) String() string { return l.text }
func (l *quantityList) Type() string   { return l.dim.String() + "s" }
func (l *quantityList) Set(s string) error {
	for _, part := range strings.Split(s, ",") {
		v, err := units.Parse(part, l.dim, "")
		if err != nil {
			return err
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
	fs.Var(newChoice(value, "", "metric", "imperial"), "units", "units to print lengths and temperatures in: metric or imperial (default: the layout's, else metric)")
}
