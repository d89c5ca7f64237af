package geometry

import (
	"errors"
	"testing"
)

func TestKindSurfaceNames(t *testing.T) {
	// The names are the ones the task fixes for printing.
	kinds := []struct {
		k    Kind
		want string
	}{{Anechoic, "anechoic"}, {HardWalled, "hard-walled"}, {OutdoorPad, "outdoor pad"}, {Kind(9), "Kind(9)"}}
	for _, tt := range kinds {
		t.Run(tt.want, func(t *testing.T) {
			if got := tt.k.String(); got != tt.want {
				t.Errorf("String: got %q, want %q", got, tt.want)
			}
			back, err := ParseKind(tt.want)
			if tt.k.Valid() != (err == nil) || (err == nil && back != tt.k) {
				t.Errorf("ParseKind(%q): got %v, %v; want %v, valid %v", tt.want, back, err, tt.k, tt.k.Valid())
			}
		})
	}
	surfaces := []struct {
		s    Surface
		want string
	}{{Hard, "hard"}, {Treated, "treated"}, {Grass, "grass"}, {Surface(-1), "Surface(-1)"}}
	for _, tt := range surfaces {
		t.Run(tt.want, func(t *testing.T) {
			if got := tt.s.String(); got != tt.want {
				t.Errorf("String: got %q, want %q", got, tt.want)
			}
			back, err := ParseSurface(tt.want)
			if tt.s.Valid() != (err == nil) || (err == nil && back != tt.s) {
				t.Errorf("ParseSurface(%q): got %v, %v; want %v, valid %v", tt.want, back, err, tt.s, tt.s.Valid())
			}
		})
	}
	if _, err := ParseKind("Anechoic"); !errors.Is(err, ErrUnknownName) {
		t.Errorf("ParseKind is exact: got %v, want ErrUnknownName", err)
	}
	if _, err := ParseSurface("lawn"); !errors.Is(err, ErrUnknownName) {
		t.Errorf("ParseSurface(lawn): got %v, want ErrUnknownName", err)
	}
}
