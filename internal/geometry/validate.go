package geometry

import (
	"errors"
	"fmt"
	"math"
	"strings"
)

// Validate returns nil when every field of c is usable, and otherwise an
// [*InputError] naming the first bad field by its Go path:
//
//   - Kind and Floor are defined values;
//   - Boundary is empty or passes [CheckRing];
//   - Ceiling is greater than 0 (+Inf allowed), TreatmentDepth finite and not negative;
//   - every footprint passes [Footprint.Validate], every obstacle has finite
//     heights with ZMin <= ZMax, and obstacle, keep-out and mark names are
//     not empty and are unique within their list;
//   - the collector, if any, has a finite inlet and heading and a diameter greater than 0;
//   - every mark is at a finite point;
//   - no coordinate, height or size exceeds [MaxCoord] in magnitude.
func (c *Cell) Validate() error {
	if !c.Kind.Valid() {
		return &InputError{Field: "Kind", Err: fmt.Errorf("%w: undefined cell kind %d", ErrOutOfRange, int(c.Kind))}
	}
	if !c.Floor.Valid() {
		return &InputError{Field: "Floor", Err: fmt.Errorf("%w: undefined floor surface %d", ErrOutOfRange, int(c.Floor))}
	}
	if c.Bounded() {
		if err := CheckRing(c.Boundary); err != nil {
			return &InputError{Field: "Boundary", Err: err}
		}
	}
	if math.IsNaN(c.Ceiling) {
		return &InputError{Field: "Ceiling", Err: fmt.Errorf("%w: got NaN (+Inf for open sky)", ErrNotFinite)}
	}
	if c.Ceiling <= 0 {
		return &InputError{Field: "Ceiling", Err: fmt.Errorf("%w: must be greater than 0 m (+Inf for open sky), got %g m", ErrOutOfRange, c.Ceiling)}
	}
	if err := checkNonNegative("TreatmentDepth", c.TreatmentDepth, "m"); err != nil {
		return err
	}
	if err := c.validateObstacles(); err != nil {
		return err
	}
	if err := c.validateKeepOuts(); err != nil {
		return err
	}
	if err := c.validateCollector(); err != nil {
		return err
	}
	names := make(map[string]int, len(c.Marks))
	for i, m := range c.Marks {
		field := fmt.Sprintf("Marks[%d]", i)
		if err := checkName(field, m.Name, names, i); err != nil {
			return err
		}
		if err := checkPoint(field+".At", m.At); err != nil {
			return err
		}
	}
	return nil
}

func (c *Cell) validateObstacles() error {
	names := make(map[string]int, len(c.Obstacles))
	for i, o := range c.Obstacles {
		field := fmt.Sprintf("Obstacles[%d]", i)
		if err := checkName(field, o.Name, names, i); err != nil {
			return err
		}
		if err := o.Solid().Validate(); err != nil {
			return within(field, err)
		}
		if err := checkCoord(field+".ZMin", o.ZMin); err != nil {
			return err
		}
		if err := checkCoord(field+".ZMax", o.ZMax); err != nil {
			return err
		}
	}
	return nil
}

func (c *Cell) validateKeepOuts() error {
	names := make(map[string]int, len(c.KeepOuts))
	for i, k := range c.KeepOuts {
		field := fmt.Sprintf("KeepOuts[%d]", i)
		if err := checkName(field, k.Name, names, i); err != nil {
			return err
		}
		if err := k.Footprint.Validate(); err != nil {
			return within(field+".Footprint", err)
		}
	}
	return nil
}

func (c *Cell) validateCollector() error {
	col := c.Collector
	if col == nil {
		return nil
	}
	for _, f := range []struct {
		name string
		v    float64
	}{
		{"Collector.Inlet.X", col.Inlet.X},
		{"Collector.Inlet.Y", col.Inlet.Y},
		{"Collector.Inlet.Z", col.Inlet.Z},
		{"Collector.Diameter", col.Diameter},
	} {
		if err := checkCoord(f.name, f.v); err != nil {
			return err
		}
	}
	if err := checkFinite("Collector.Heading", col.Heading); err != nil {
		return err
	}
	if col.Diameter <= 0 {
		return &InputError{Field: "Collector.Diameter", Err: fmt.Errorf("%w: must be greater than 0 m, got %g m", ErrOutOfRange, col.Diameter)}
	}
	return nil
}

// Validate returns nil when s is usable, and otherwise an [*InputError]
// naming the bad field: the footprint passes [Footprint.Validate], ZMin and
// ZMax are not NaN, and ZMin <= ZMax. Infinite heights are allowed (a
// full-height zone is ZMin = −Inf or 0 and ZMax = +Inf); an obstacle of
// a [Cell] must have finite heights, which Cell.Validate checks.
func (s Solid) Validate() error {
	if err := s.Footprint.Validate(); err != nil {
		return within("Footprint", err)
	}
	if math.IsNaN(s.ZMin) {
		return &InputError{Field: "ZMin", Err: fmt.Errorf("%w: got NaN", ErrNotFinite)}
	}
	if math.IsNaN(s.ZMax) {
		return &InputError{Field: "ZMax", Err: fmt.Errorf("%w: got NaN", ErrNotFinite)}
	}
	if s.ZMin > s.ZMax {
		return &InputError{Field: "ZMax", Err: fmt.Errorf("%w: top %g m is below bottom %g m", ErrOutOfRange, s.ZMax, s.ZMin)}
	}
	return nil
}

// checkName checks that name is not empty and not already in names (which
// maps names to their index in the list), then records it.
func checkName(field, name string, names map[string]int, i int) error {
	if name == "" {
		return &InputError{Field: field + ".Name", Err: fmt.Errorf("%w: empty name", ErrOutOfRange)}
	}
	if j, ok := names[name]; ok {
		list, _, _ := strings.Cut(field, "[")
		return &InputError{Field: field + ".Name", Err: fmt.Errorf("%w: %q is also the name of %s[%d]", ErrDuplicateName, name, list, j)}
	}
	names[name] = i
	return nil
}

// within places err inside field: an *InputError gets field prefixed to its
// path, any other error is wrapped in a new *InputError for field.
func within(field string, err error) error {
	var ie *InputError
	if errors.As(err, &ie) {
		return &InputError{Field: field + "." + ie.Field, Err: ie.Err}
	}
	return &InputError{Field: field, Err: err}
}
