package layout

import (
	"strings"

	"go.yaml.in/yaml/v3"

	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// Defaults of the ambient section.
const (
	// DefaultPressure is the ambient pressure when none is given, Pa: one
	// standard atmosphere, 101 325 Pa (10th CGPM, 1954, Resolution 4).
	DefaultPressure = units.StandardAtmosphere
	// DefaultTemperature is the ambient temperature when none is given, K:
	// 15 °C, the sea-level temperature of the ISO 2533:1975 standard
	// atmosphere.
	DefaultTemperature = units.ZeroCelsius + 15
	// DefaultHumidity is the relative humidity when none is given, percent:
	// 60 %, a typical indoor value (common practice; not a standard value).
	DefaultHumidity = 60
)

// Plausible ambient values. A value outside them parses but is almost
// certainly a slip of unit, and is an error that suggests the fix.
const (
	// MinPressure and MaxPressure bound a plausible ambient pressure, Pa.
	// 30 kPa is about the pressure of the ISO 2533:1975 standard atmosphere
	// at 9 km altitude (30.7 kPa; from memory), far above any test site;
	// 130 kPa is well above the highest sea-level pressures recorded, about
	// 108 kPa (from memory). The bounds themselves are common practice.
	MinPressure = 30e3
	MaxPressure = 130e3
	// MinTemperature and MaxTemperature bound a plausible ambient
	// temperature, K: −60 °C and +60 °C, beyond the extremes of outdoor air
	// at test sites (common practice).
	MinTemperature = units.ZeroCelsius - 60
	MaxTemperature = units.ZeroCelsius + 60
)

var (
	ambientKeys = []string{"pressure", "temperature", "humidity"}
	limitKeys   = []string{"velocity", "temperature", "margin", "wall_clearance", "stand_spacing", "inflow", "far_field_ratio", "absorption"}
	bandKeys    = []string{"low", "high"}
)

// ambientSection decodes the ambient air, with defaults for absent keys.
// ok is false when a given value is unusable.
func (d *decoder) ambientSection(top *section) (planner.Ambient, bool) {
	s := top.sub("ambient", ambientKeys)
	a := planner.Ambient{Pressure: DefaultPressure, Temperature: DefaultTemperature, Humidity: DefaultHumidity}
	ok := s.isMap
	if n := s.get("pressure"); n != nil {
		p, good := d.pressure(n, s.field("pressure"))
		if good && !inside(p, MinPressure, MaxPressure) {
			d.implausible(n, s.field("pressure"), "ambient pressure", units.FormatPressure(p, units.Metric), "30 kPa to 130 kPa",
				units.Pressure, []string{"kPa", "hPa", "mbar", "psi", "inHg", "bar", "atm", "mmHg"},
				func(v float64) bool { return inside(v, MinPressure, MaxPressure) })
			good = false
		}
		a.Pressure, ok = p, ok && good
	}
	if n := s.get("temperature"); n != nil {
		t, good := d.temperature(n, s.field("temperature"))
		if good && !inside(t, MinTemperature, MaxTemperature) {
			d.implausible(n, s.field("temperature"), "ambient temperature", units.FormatTemperature(t, units.Metric), "-60 °C to +60 °C",
				units.Temperature, []string{"C", "F", "K"},
				func(v float64) bool { return inside(v, MinTemperature, MaxTemperature) })
			good = false
		}
		a.Temperature, ok = t, ok && good
	}
	if n := s.get("humidity"); n != nil {
		h, good := d.quantity(n, s.field("humidity"), units.Fraction, "%")
		if good && (h < 0 || h > 1) {
			d.errorf(ErrInvalid, n.Line, s.field("humidity"), "the relative humidity must be from 0 %% to 100 %%, got %q", n.Value)
			good = false
		}
		a.Humidity, ok = h*100, ok && good
	}
	return a, ok
}

// implausible reports a quantity outside its plausible range and, when the
// same number in another unit would fit, suggests it.
func (d *decoder) implausible(n *yaml.Node, field, what, got, want string, dim units.Dim, candidates []string, plausible func(float64) bool) {
	msg := what + " " + got + " is implausible; want " + want
	if fix := suggestUnit(n.Value, dim, candidates, plausible); fix != "" {
		msg += "; did you mean \"" + fix + "\"?"
	}
	d.add(ErrInvalid, nil, n.Line, field, msg)
}

// limitsSection decodes the check limits; absent keys take their defaults
// from planner.DefaultLimits. Every limit given must be greater than 0, and
// the temperature limit above the ambient temperature.
func (d *decoder) limitsSection(top *section, amb planner.Ambient, ambOK bool) planner.Limits {
	s := top.sub("limits", limitKeys)
	l := planner.DefaultLimits()
	positive := func(key string, v float64, ok bool, shown string) float64 {
		if ok && v <= 0 {
			d.errorf(ErrInvalid, s.keyLine(key), s.field(key), "must be greater than 0, got %s (leave the key out for the default)", shown)
		}
		return v
	}
	// upper bounds; a value at most 0 is positive's message
	atMost := func(key string, v float64, ok bool, r Range) {
		if n := s.get(key); ok && v > 0 && n != nil {
			d.checkRange(n.Line, s.field(key), r, v, "")
		}
	}
	if n := s.get("velocity"); n != nil {
		v, ok := d.velocity(n, s.field("velocity"))
		l.Velocity = positive("velocity", v, ok, units.FormatVelocity(v, d.sys))
		atMost("velocity", v, ok, VelocityLimitRange)
	}
	if n := s.get("temperature"); n != nil {
		if t, ok := d.temperature(n, s.field("temperature")); ok {
			l.Temperature = t
			switch {
			case ambOK && t <= amb.Temperature:
				d.errorf(ErrInvalid, n.Line, s.field("temperature"), "the hot-zone limit %s must be above the ambient temperature %s",
					units.FormatTemperature(t, d.sys), units.FormatTemperature(amb.Temperature, d.sys))
			case t > MaxTotalTemperature:
				d.checkRange(n.Line, s.field("temperature"), TempLimitRange, t, "")
			}
		}
	}
	for _, f := range []struct {
		key string
		dst *float64
	}{
		{"margin", &l.Margin}, {"wall_clearance", &l.WallClearance}, {"stand_spacing", &l.StandSpacing},
	} {
		if n := s.get(f.key); n != nil {
			v, ok := d.length(n, s.field(f.key))
			*f.dst = positive(f.key, v, ok, d.fmtLen(v))
		}
	}
	if n := s.get("inflow"); n != nil {
		v, ok := d.velocity(n, s.field("inflow"))
		l.Inflow = positive("inflow", v, ok, units.FormatVelocity(v, d.sys))
		atMost("inflow", v, ok, Range{What: "inflow limit", Max: MaxVelocityLimit, MinOpen: true, Unit: "m/s"})
	}
	if n := s.get("far_field_ratio"); n != nil {
		v, ok := d.number(n, s.field("far_field_ratio"), "the smallest arc radius over the jet diameter, a number")
		l.FarFieldRatio = positive("far_field_ratio", v, ok, n.Value)
		atMost("far_field_ratio", v, ok, Range{What: "far-field ratio", Max: MaxFarFieldRatio, MinOpen: true})
	}
	if n := s.get("absorption"); n != nil {
		v, ok := d.decibels(n, s.field("absorption"))
		l.Absorption = positive("absorption", v, ok, n.Value)
		atMost("absorption", v, ok, Range{What: "absorption limit", Max: MaxAbsorption, MinOpen: true, Unit: "dB"})
	}
	return l
}

// decibels reads a level in dB, written "3 dB" or "3".
func (d *decoder) decibels(n *yaml.Node, field string) (float64, bool) {
	const want = "a level in dB, such as 3 dB"
	s, ok := d.scalar(n, field, want)
	if !ok {
		return 0, false
	}
	c := *n
	c.Value = strings.TrimSpace(strings.TrimSuffix(strings.TrimSpace(s), "dB"))
	c.Tag = "!!str"
	v, ok := d.number(&c, field, want)
	if !ok {
		return 0, false
	}
	return v, true
}

// bandSection decodes the frequency band of interest, Hz.
func (d *decoder) bandSection(top *section) planner.Band {
	s := top.needSub("band", "the frequency band of interest, {low: …, high: …}", bandKeys)
	var b planner.Band
	var okLow, okHigh bool
	read := func(key string) (float64, bool) {
		n := s.need(key, "a frequency such as 200 Hz")
		if n == nil {
			return 0, false
		}
		f, ok := d.frequency(n, s.field(key))
		if ok && f <= 0 {
			d.errorf(ErrInvalid, n.Line, s.field(key), "must be greater than 0 Hz, got %s", units.FormatFrequency(f))
			ok = false
		} else if ok {
			ok = d.checkRange(n.Line, s.field(key), BandRange, f, "")
		}
		return f, ok
	}
	b.Low, okLow = read("low")
	b.High, okHigh = read("high")
	if okLow && okHigh && b.Low >= b.High {
		d.errorf(ErrInvalid, s.keyLine("high"), s.field("high"), "the top of the band (%s) must be above its bottom (%s)",
			units.FormatFrequency(b.High), units.FormatFrequency(b.Low))
	}
	return b
}
