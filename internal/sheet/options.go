package sheet

import (
	"fmt"
	"strings"

	"arcwright/internal/planner"
)

// Options are the caller's wishes for the sheet. The zero value takes the
// paper and scale from the plan's request. There is no clock: the issue
// date comes from the layout (see [Build]).
type Options struct {
	// Paper is one of [Papers] by name or alias ("A1", "ANSI D",
	// "Tabloid", "Arch D"; case, spaces and hyphens are ignored); ""
	// takes Plan.Request.Sheet.Paper, and A3 when that is empty too. The
	// sheet is always landscape.
	Paper string
	// Scale is the plan's scale denominator (50 means 1:50), one of
	// [StandardScales]; 0 takes Plan.Request.Sheet.Scale, and when that is
	// 0 too the largest standard scale of the layout's unit system at which
	// the plan fits. A scale at which the plan does not fit even when
	// cropped to its region of interest is an error naming the scale and
	// the paper that would.
	Scale int
}

// Paper is a sheet size, landscape, in millimetres.
type Paper struct {
	Name          string
	Width, Height float64 // mm, Width > Height
	// Aliases are other names the paper is known by ("Letter" for ANSI A).
	Aliases []string `json:",omitempty"`
}

// papers are the supported sizes, landscape. ISO 216 A4 to A0 (297 × 210,
// 420 × 297, 594 × 420, 841 × 594, 1189 × 841 mm; acoustics.md §8.2,
// CONFIRMED for A4 and A3, the others by halving A0 of 1 m², FROM MEMORY),
// ANSI/ASME Y14.1 A to E (8.5 × 11, 11 × 17, 17 × 22, 22 × 34, 34 × 44 in)
// and the architectural sizes Arch A to E1 (9 × 12, 12 × 18, 18 × 24,
// 24 × 36, 36 × 48, 30 × 42 in; FROM MEMORY), at 25.4 mm/in.
var papers = []Paper{
	{Name: "A4", Width: 297, Height: 210},
	{Name: "A3", Width: 420, Height: 297},
	{Name: "A2", Width: 594, Height: 420},
	{Name: "A1", Width: 841, Height: 594},
	{Name: "A0", Width: 1189, Height: 841},
	{Name: "Letter", Width: 279.4, Height: 215.9, Aliases: []string{"ANSI A"}},
	{Name: "Tabloid", Width: 431.8, Height: 279.4, Aliases: []string{"ANSI B", "Ledger"}},
	{Name: "ANSI C", Width: 558.8, Height: 431.8},
	{Name: "ANSI D", Width: 863.6, Height: 558.8},
	{Name: "ANSI E", Width: 1117.6, Height: 863.6},
	{Name: "Arch A", Width: 304.8, Height: 228.6},
	{Name: "Arch B", Width: 457.2, Height: 304.8},
	{Name: "Arch C", Width: 609.6, Height: 457.2},
	{Name: "Arch D", Width: 914.4, Height: 609.6},
	{Name: "Arch E1", Width: 1066.8, Height: 762},
	{Name: "Arch E", Width: 1219.2, Height: 914.4},
}

// Papers returns the supported paper sizes, landscape.
func Papers() []Paper { return append([]Paper(nil), papers...) }

// PaperNames lists the papers' names for messages and help: "A4, A3, …".
func PaperNames() string {
	var n []string
	for _, p := range papers {
		s := p.Name
		if len(p.Aliases) > 0 {
			s += " (" + p.Aliases[0] + ")"
		}
		n = append(n, s)
	}
	return strings.Join(n, ", ")
}

// paperKey normalises a paper name: lower case without spaces, hyphens or
// underscores ("ANSI-D" and "ansi d" are "ansid").
func paperKey(s string) string {
	return strings.Map(func(r rune) rune {
		switch r {
		case ' ', '-', '_', '\t':
			return -1
		}
		if r >= 'A' && r <= 'Z' {
			return r + 'a' - 'A'
		}
		return r
	}, s)
}

// ParsePaper returns the paper named s, by its name or an alias; case,
// spaces and hyphens are ignored. The error wraps [ErrUnknownPaper] and
// lists the papers.
func ParsePaper(s string) (Paper, error) {
	k := paperKey(s)
	for _, p := range papers {
		if paperKey(p.Name) == k {
			return p, nil
		}
		for _, a := range p.Aliases {
			if paperKey(a) == k {
				return p, nil
			}
		}
	}
	return Paper{}, fmt.Errorf("%w %q: want one of %s", ErrUnknownPaper, strings.TrimSpace(s), PaperNames())
}

// resolvePaper returns the paper the options and the plan ask for.
func resolvePaper(opt Options, req *planner.Request) (Paper, error) {
	name, field := opt.Paper, "the paper asked for"
	if strings.TrimSpace(name) == "" {
		name, field = req.Sheet.Paper, "the layout's sheet paper"
	}
	if strings.TrimSpace(name) == "" {
		return ParsePaper("A3")
	}
	p, err := ParsePaper(name)
	if err != nil {
		return Paper{}, fmt.Errorf("%s: %w", field, err)
	}
	return p, nil
}

// resolveScale returns the scale denominator asked for (0: choose) and
// words naming who asked, for messages.
func resolveScale(opt Options, req *planner.Request) (int, string, error) {
	s, field := opt.Scale, "the scale asked for"
	if s == 0 {
		s, field = req.Sheet.Scale, "the layout's sheet scale"
	}
	if s == 0 {
		return 0, field, nil
	}
	if !isStandard(s) {
		return 0, field, fmt.Errorf("%w: %s, 1:%d, is not a standard scale: want one of %s", ErrScale, field, s, ScaleNames())
	}
	if r := otherFamily(s, req.Units); r != "" {
		return 0, field, fmt.Errorf("%w: %s: %s", ErrScale, field, r)
	}
	return s, field, nil
}
