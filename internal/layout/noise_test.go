package layout

import (
	"strings"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"
)

func TestNoiseKeys(t *testing.T) {
	text := edit(t, baseLayout,
		"    pole_diameter: 25 mm\n", "    pole_diameter: 25 mm\n    microphone: 1/2 in\n",
		"    stand: tripod\n", "    stand: tripod\n    microphone: {size: 1/4 in, max_level: 165 dB, upper_frequency: 100 kHz}\n")
	text += `noise:
  contours: [95 dB(A), 100]
crew:
  - name: desk
    at: [7, 5.5]
    hours: 30 min
  - name: door
    at: [0.5, 5.5]
    height: 1.2 m
`
	req, warns := mustDecode(t, text)
	if len(warns) != 0 {
		t.Errorf("got warnings %v", warns)
	}
	// typical limits of the sizes (acoustics.md §5.1, FROM MEMORY): the
	// cautious end, 140 dB and 20 kHz for 1/2 in
	if m := req.Stands[0].Microphone; m == nil || m.Name != "1/2 in" || m.MaxLevel != 140 || m.UpperFrequency != 20e3 {
		t.Errorf("stand microphone: got %+v, want 1/2 in, 140 dB, 20 kHz", m)
	}
	if m := req.Arrays[0].Microphone; m == nil || m.Name != "1/4 in" || m.MaxLevel != 165 || m.UpperFrequency != 100e3 {
		t.Errorf("array microphone: got %+v, want 1/4 in with the data sheet's 165 dB and 100 kHz", m)
	}
	if c := req.Noise.Contours; len(c) != 2 || c[0] != 95 || c[1] != 100 {
		t.Errorf("contours: got %v, want [95 100]", c)
	}
	if len(req.Crew) != 2 {
		t.Fatalf("got %d crew positions, want 2", len(req.Crew))
	}
	if c := req.Crew[0]; c.Name != "desk" || c.At != (r3.Vec{X: 7, Y: 5.5, Z: 1.6}) || c.Hours != 0.5 {
		t.Errorf("desk: got %+v, want at (7, 5.5) at the default 1.6 m ear height for 0.5 h", c)
	}
	if c := req.Crew[1]; c.At.Z != 1.2 || c.Hours != DefaultCrewHours {
		t.Errorf("door: got %+v, want 1.2 m high for the default 8 h", c)
	}
}

func TestNoiseKeyErrors(t *testing.T) {
	tests := []struct {
		name, add, want string
	}{
		{"unknown size", "    stand: tripod\n    microphone: 3/8 in\n", "arrays[0].microphone: want a nominal size"},
		{"limits missing", "    stand: tripod\n    microphone: {max_level: 150 dB}\n", "give a nominal size"},
		{"bad level", "    stand: tripod\n    microphone: {size: 1/4 in, max_level: loud}\n", "want a level in dB"},
		{"implausible level", "noise:\n  contours: [500 dB(A)]\n", "noise.contours[0]: the level 500 dB is implausible"},
		// contours are A-weighted; a C-weighted or unweighted value is not
		// silently drawn as dB(A)
		{"C-weighted contour", "noise:\n  contours: [135 dB(C)]\n", "noise.contours[0]: contours are A-weighted levels, got \"135 dB(C)\""},
		{"dBC contour", "noise:\n  contours: [95 dBA, 137 dBC]\n", "noise.contours[1]: contours are A-weighted levels"},
		{"unweighted contour", "noise:\n  contours: [95 dB]\n", "noise.contours[0]: contours are A-weighted levels"},
		// a microphone's upper limit is unweighted, dB re 20 µPa
		{"weighted max_level", "    stand: tripod\n    microphone: {size: 1/4 in, max_level: 130 dB(A), upper_frequency: 100 kHz}\n", "arrays[0].microphone.max_level: a microphone's upper limit is an unweighted level"},
		{"dBC max_level", "    stand: tripod\n    microphone: {size: 1/4 in, max_level: 150 dBC, upper_frequency: 100 kHz}\n", "arrays[0].microphone.max_level: a microphone's upper limit is an unweighted level"},
		{"both room keys", "noise:\n  room_absorption: 0.1\n  reverberation_time: 2 s\n", "give room_absorption or reverberation_time, not both"},
		// the plausible range 0.01–0.99 is ours (a guard against slips)
		{"absorption above 1", "noise:\n  room_absorption: 1.5\n", "noise.room_absorption: want an average absorption coefficient from 0.01 to 0.99"},
		{"absorption tiny", "noise:\n  room_absorption: 1e-300\n", "noise.room_absorption: want an average absorption coefficient from 0.01 to 0.99, got 1e-300"},
		// 8 × 6 × 4 m: V = 192 m³, S = 208 m²; Eyring 1930 (FROM MEMORY):
		// ᾱ = 1 − exp(−0.161·192/(208·T60)): 0.9488 at 0.05 s (plausible),
		// 0.9999996 at 0.01 s, 0.0074 at 20 s (DERIVED); ᾱ 0.99 and 0.01 at
		// 0.032 s and 14.8 s
		{"reverberation too short", "noise:\n  reverberation_time: 0.01 s\n", "noise.reverberation_time: the reverberation time 0.01 s gives an average absorption coefficient of 1 (Eyring) in this room; want 0.032 s to 14.8 s"},
		{"reverberation too long", "noise:\n  reverberation_time: 20 s\n", "noise.reverberation_time: the reverberation time 20 s gives an average absorption coefficient of 0.0074"},
		{"crew without place", "crew:\n  - name: desk\n", "crew[0].at: missing"},
		{"crew hours", "crew:\n  - name: desk\n    at: [1, 1]\n    hours: 30 h\n", "crew[0].hours: want a time of at least 1 s and at most 24 h"},
		{"crew above ceiling", "crew:\n  - name: desk\n    at: [1, 1]\n    height: 9 m\n", "crew[0].height: the ear height is above the ceiling"},
		{"unknown crew key", "crew:\n  - name: desk\n    at: [1, 1]\n    shift: 2\n", "crew[0].shift: unknown key"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			text := strings.Replace(baseLayout, "kind: anechoic", "kind: hard-walled", 1)
			if strings.HasPrefix(tt.add, "    stand: tripod\n") {
				text = edit(t, text, "    stand: tripod\n", tt.add)
			} else {
				text += tt.add
			}
			es := decodeErrors(t, text)
			if !strings.Contains(es.Error(), tt.want) || !strings.Contains(es.Error(), "test.yaml:") {
				t.Errorf("got %v, want an error with file and line saying %q", es, tt.want)
			}
		})
	}
	// a repeated contour, or the 85 dB(A) always drawn, is refused (plan
	// does not print the decoder's warnings, so a dropped one would go
	// unseen)
	es := decodeErrors(t, baseLayout+"noise:\n  contours: [95 dB(A), 85 dB(A), 95]\n")
	for _, want := range []string{"test.yaml:32: noise.contours[1]: 85 dB(A) is always drawn", "test.yaml:32: noise.contours[2]: 95 dB(A) is already in the list"} {
		if !strings.Contains(es.Error(), want) {
			t.Errorf("got %v, want %q", es, want)
		}
	}
	// the room's absorption outside a hard-walled cell is a warning
	_, warns := mustDecode(t, baseLayout+"noise:\n  room_absorption: 0.1\n")
	if len(warns) != 1 || !strings.Contains(warns[0].String(), "only for a hard-walled cell") {
		t.Errorf("got warnings %v, want one about the hard-walled cell", warns)
	}
}
