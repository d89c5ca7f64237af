package units

import (
	"fmt"
	"strings"
)

// System selects how quantities are printed. The zero value is not a system;
// passing it to a Format function panics.
type System int

// The unit systems.
const (
	// Metric prints metres (millimetres below 1 m), °C, kPa and m/s.
	Metric System = iota + 1
	// Imperial prints feet and inches as a tape reads (1/8 in, 1 in from
	// 100 ft), °F, psi and ft/s.
	Imperial
)

// String returns "metric" or "imperial"; other values print as "System(n)".
func (s System) String() string {
	switch s {
	case Metric:
		return "metric"
	case Imperial:
		return "imperial"
	}
	return fmt.Sprintf("System(%d)", int(s))
}

// ParseSystem reads a unit system name: "metric", or "imperial" with its
// synonyms "feet-and-inches" and "ft-in". Case and surrounding white space
// are ignored. Any other name gives an error wrapping [ErrUnknownSystem].
func ParseSystem(s string) (System, error) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "metric":
		return Metric, nil
	case "imperial", "feet-and-inches", "ft-in":
		return Imperial, nil
	}
	return 0, fmt.Errorf("%w %q (want metric, imperial, feet-and-inches or ft-in)", ErrUnknownSystem, s)
}

// mustSystem panics, as programmer misuse, if sys is not Metric or Imperial.
func mustSystem(fn string, sys System) {
	if sys != Metric && sys != Imperial {
		panic(fmt.Sprintf("units: %s: invalid %v", fn, sys))
	}
}
