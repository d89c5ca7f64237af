package geometry

import (
	"fmt"
	"strconv"
)

// Kind is the kind of test cell. It decides what the boundary means: the
// wedge-tip plane of an anechoic chamber, the inner wall face of a
// hard-walled cell, or the site limit of an outdoor pad.
type Kind int

// The kinds of cell. The zero value is Anechoic.
const (
	Anechoic   Kind = iota // anechoic chamber; the boundary is the wedge-tip plane
	HardWalled             // hard-walled (reverberant) cell; the boundary is the inner wall face
	OutdoorPad             // outdoor static pad; the boundary, if any, is the site limit
)

var kindNames = [...]string{
	Anechoic:   "anechoic",
	HardWalled: "hard-walled",
	OutdoorPad: "outdoor pad",
}

// String returns "anechoic", "hard-walled" or "outdoor pad", and "Kind(n)"
// for a value outside the defined kinds.
func (k Kind) String() string {
	if k >= 0 && int(k) < len(kindNames) {
		return kindNames[k]
	}
	return "Kind(" + strconv.Itoa(int(k)) + ")"
}

// Valid reports whether k is one of the defined kinds.
func (k Kind) Valid() bool { return k >= 0 && int(k) < len(kindNames) }

// ParseKind returns the Kind whose String is s. The match is exact.
// An unknown name gives an error wrapping [ErrUnknownName].
func ParseKind(s string) (Kind, error) {
	for k, name := range kindNames {
		if s == name {
			return Kind(k), nil
		}
	}
	return 0, fmt.Errorf("%w: cell kind %q (want %q, %q or %q)",
		ErrUnknownName, s, kindNames[Anechoic], kindNames[HardWalled], kindNames[OutdoorPad])
}

// Surface is the acoustic character of the cell floor.
type Surface int

// The floor surfaces. The zero value is Hard.
const (
	Hard    Surface = iota // hard, acoustically reflecting floor (concrete, asphalt, steel plate)
	Treated                // floor covered with wedges or absorbent
	Grass                  // grass or soil: a finite-impedance ground
)

var surfaceNames = [...]string{
	Hard:    "hard",
	Treated: "treated",
	Grass:   "grass",
}

// String returns "hard", "treated" or "grass", and "Surface(n)" for a value
// outside the defined surfaces.
func (s Surface) String() string {
	if s >= 0 && int(s) < len(surfaceNames) {
		return surfaceNames[s]
	}
	return "Surface(" + strconv.Itoa(int(s)) + ")"
}

// Valid reports whether s is one of the defined surfaces.
func (s Surface) Valid() bool { return s >= 0 && int(s) < len(surfaceNames) }

// ParseSurface returns the Surface whose String is s. The match is exact.
// An unknown name gives an error wrapping [ErrUnknownName].
func ParseSurface(s string) (Surface, error) {
	for k, name := range surfaceNames {
		if s == name {
			return Surface(k), nil
		}
	}
	return 0, fmt.Errorf("%w: floor surface %q (want %q, %q or %q)",
		ErrUnknownName, s, surfaceNames[Hard], surfaceNames[Treated], surfaceNames[Grass])
}
