package jet

import (
	"fmt"
	"math"
)

// Kind is the nozzle type.
type Kind int

// Nozzle kinds.
const (
	// Convergent nozzles choke at the critical pressure ratio and are
	// under-expanded above it.
	Convergent Kind = iota + 1
	// ConvergentDivergent nozzles have a supersonic design Mach number; they
	// are over-expanded below its pressure ratio and under-expanded above.
	ConvergentDivergent
	// Rectangular nozzles are convergent (or convergent-divergent when a
	// design Mach number above 1 is given) with a rectangular exit of width
	// (long side) and height (short side).
	Rectangular
	// Coaxial nozzles have a primary (core) stream of diameter Diameter and a
	// secondary (bypass) annulus of outer diameter SecondaryDiameter; both
	// streams are convergent. The pair is replaced by a single mixed jet
	// for the plume; [SeparateStreams] gives each stream alone.
	Coaxial
)

var kindNames = map[Kind]string{
	Convergent:          "convergent",
	ConvergentDivergent: "convergent-divergent",
	Rectangular:         "rectangular",
	Coaxial:             "coaxial",
}

func (k Kind) String() string {
	if s, ok := kindNames[k]; ok {
		return s
	}
	return fmt.Sprintf("Kind(%d)", int(k))
}

// Contour is how the flow is brought to the exit.
type Contour int

// Exit contours.
const (
	// Contoured is a nozzle with a smooth contraction: a nearly uniform
	// (top-hat) exit profile and thin boundary layers. The zero value.
	Contoured Contour = iota
	// Pipe is a straight duct: a fully developed turbulent exit profile,
	// whose jet decays and spreads more slowly (see Model.PipeB).
	Pipe
)

func (c Contour) String() string {
	if c == Pipe {
		return "pipe"
	}
	return "nozzle"
}

// Nozzle is the geometry of the nozzle exit.
type Nozzle struct {
	Kind Kind
	// Contour says whether the exit is a contoured nozzle (the zero value)
	// or the end of a straight pipe.
	Contour Contour
	// Diameter is the exit diameter, m (the primary nozzle for Coaxial).
	// Unused for Rectangular.
	Diameter float64
	// DesignMach is the exit Mach number a convergent-divergent nozzle is
	// designed for (> 1). For Rectangular, 0 or 1 means convergent.
	DesignMach float64
	// Width and Height are the long and short sides of a rectangular exit, m.
	Width, Height float64
	// SecondaryDiameter is the outer diameter of a coaxial nozzle's secondary
	// annulus at the exit, m; it must exceed Diameter.
	SecondaryDiameter float64
}

// RectangularFromAspect returns a rectangular nozzle of exit area π·de²/4 and
// aspect ratio ar = width/height ≥ 1.
func RectangularFromAspect(de, ar, designMach float64) Nozzle {
	area := math.Pi * de * de / 4
	return Nozzle{Kind: Rectangular, Width: math.Sqrt(area * ar), Height: math.Sqrt(area / ar), DesignMach: designMach}
}

// ExitArea returns the area through which the primary (or only) stream
// leaves, m².
func (n Nozzle) ExitArea() float64 {
	if n.Kind == Rectangular {
		return n.Width * n.Height
	}
	return math.Pi * n.Diameter * n.Diameter / 4
}

// SecondaryArea returns the annulus area of a coaxial nozzle, m²; 0 otherwise.
func (n Nozzle) SecondaryArea() float64 {
	if n.Kind != Coaxial {
		return 0
	}
	return math.Pi * (n.SecondaryDiameter*n.SecondaryDiameter - n.Diameter*n.Diameter) / 4
}

// EquivalentDiameter returns the diameter of the circle of the same total
// exit area, m: sqrt(4A/π) (the area-equivalent diameter used for
// rectangular nozzles, Krothapalli, Baganoff & Karamcheti 1981, from memory).
func (n Nozzle) EquivalentDiameter() float64 {
	return math.Sqrt(4 * (n.ExitArea() + n.SecondaryArea()) / math.Pi)
}

// AspectRatio returns width/height of a rectangular exit, 1 otherwise.
func (n Nozzle) AspectRatio() float64 {
	if n.Kind != Rectangular || n.Height <= 0 {
		return 1
	}
	return n.Width / n.Height
}

// designMach returns the exit Mach number the nozzle is shaped for: 1 for
// convergent exits.
func (n Nozzle) designMach() float64 {
	if (n.Kind == ConvergentDivergent || n.Kind == Rectangular) && n.DesignMach > 1 {
		return n.DesignMach
	}
	return 1
}

// Validate reports the first input that cannot describe a real nozzle.
func (n Nozzle) Validate() error {
	switch n.Kind {
	case Convergent, ConvergentDivergent, Coaxial:
		if err := positive("nozzle diameter", n.Diameter, "m"); err != nil {
			return err
		}
	case Rectangular:
		if err := positive("nozzle width", n.Width, "m"); err != nil {
			return err
		}
		if err := positive("nozzle height", n.Height, "m"); err != nil {
			return err
		}
		if n.Height > n.Width {
			return &InputError{Field: "nozzle height", Reason: fmt.Sprintf("must not exceed the width (the long side): height %g m, width %g m", n.Height, n.Width)}
		}
	default:
		return &InputError{Field: "nozzle kind", Reason: "must be convergent, convergent-divergent, rectangular or coaxial"}
	}
	switch {
	case n.Contour != Contoured && n.Contour != Pipe:
		return &InputError{Field: "nozzle contour", Reason: "must be nozzle or pipe"}
	case n.Contour == Pipe && (n.Kind == ConvergentDivergent || n.Kind == Coaxial):
		return &InputError{Field: "nozzle contour", Reason: fmt.Sprintf("pipe applies to convergent and rectangular exits, not %s", n.Kind)}
	}
	switch n.Kind {
	case ConvergentDivergent:
		if err := finite("design Mach number", n.DesignMach); err != nil {
			return err
		}
		if n.DesignMach <= 1 {
			return &InputError{Field: "design Mach number", Reason: fmt.Sprintf("must be greater than 1 for a convergent-divergent nozzle, got %g", n.DesignMach)}
		}
	case Rectangular:
		if err := finite("design Mach number", n.DesignMach); err != nil {
			return err
		}
		if n.DesignMach < 0 {
			return &InputError{Field: "design Mach number", Reason: fmt.Sprintf("must be 0 (convergent) or greater than 1, got %g", n.DesignMach)}
		}
	case Coaxial:
		if err := positive("secondary diameter", n.SecondaryDiameter, "m"); err != nil {
			return err
		}
		if n.SecondaryDiameter <= n.Diameter {
			return &InputError{Field: "secondary diameter", Reason: fmt.Sprintf("must exceed the primary diameter %g m, got %g m", n.Diameter, n.SecondaryDiameter)}
		}
	}
	return nil
}

func finite(name string, v float64) error {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return &InputError{Field: name, Reason: fmt.Sprintf("must be a finite number, got %v", v)}
	}
	return nil
}

// Stream is the reservoir state of one nozzle stream.
type Stream struct {
	// NPR is the nozzle pressure ratio, total pressure over ambient pressure
	// (> 1).
	NPR float64
	// TotalTemperature is the total (stagnation) temperature, K. When 0,
	// TemperatureRatio is used instead.
	TotalTemperature float64
	// TemperatureRatio is the total temperature over the ambient
	// temperature; used only when TotalTemperature is 0.
	TemperatureRatio float64
	// Gas is the stream's gas; the zero value means air.
	Gas Gas
}

func (s Stream) gas() Gas {
	if s.Gas == (Gas{}) {
		return Air()
	}
	return s.Gas
}

func (s Stream) total(a Ambient) float64 {
	if s.TotalTemperature > 0 {
		return s.TotalTemperature
	}
	return s.TemperatureRatio * a.Temperature
}

func (s Stream) validate(prefix string) error {
	if err := finite(prefix+"nozzle pressure ratio", s.NPR); err != nil {
		return err
	}
	if s.NPR <= 1 {
		return &InputError{Field: prefix + "nozzle pressure ratio", Reason: fmt.Sprintf("must be greater than 1 (total pressure over ambient pressure; 1 means no flow), got %g", s.NPR)}
	}
	switch {
	case s.TotalTemperature != 0:
		if err := positive(prefix+"total temperature", s.TotalTemperature, "K"); err != nil {
			return err
		}
	default:
		if err := positive(prefix+"total-temperature ratio", s.TemperatureRatio, "(ratio)"); err != nil {
			return &InputError{Field: prefix + "total temperature", Reason: "or its ratio to ambient must be given and greater than 0"}
		}
	}
	g := s.gas()
	if err := finite(prefix+"ratio of specific heats", g.Gamma); err != nil {
		return err
	}
	if g.Gamma <= 1 || g.Gamma > 5.0/3 {
		return &InputError{Field: prefix + "ratio of specific heats", Reason: fmt.Sprintf("must be greater than 1 and at most 5/3, got %g", g.Gamma)}
	}
	return positive(prefix+"gas constant", g.R, "J/(kg K)")
}

// Condition is one operating point of the test matrix.
type Condition struct {
	Name      string
	Primary   Stream
	Secondary *Stream // the bypass stream of a coaxial nozzle; nil otherwise
	Ambient   Ambient
}

// Validate reports the first input of c that the model cannot use with n.
func (c Condition) Validate(n Nozzle) error {
	if err := n.Validate(); err != nil {
		return err
	}
	if err := c.Ambient.validate(); err != nil {
		return err
	}
	if err := c.Primary.validate(""); err != nil {
		return err
	}
	switch {
	case n.Kind == Coaxial && c.Secondary == nil:
		return &InputError{Field: "secondary stream", Reason: "is required for a coaxial nozzle"}
	case n.Kind != Coaxial && c.Secondary != nil:
		return &InputError{Field: "secondary stream", Reason: "is only used with a coaxial nozzle"}
	case c.Secondary != nil:
		return c.Secondary.validate("secondary ")
	}
	return nil
}
