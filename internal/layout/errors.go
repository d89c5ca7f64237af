package layout

import (
	"errors"
	"fmt"
	"sort"
	"strconv"
	"strings"
)

// Sentinel errors. Every [*Error] wraps one of them, so a caller can sort
// problems with errors.Is without reading messages.
var (
	// ErrSyntax: the file is not well-formed YAML, or holds no layout.
	ErrSyntax = errors.New("layout: bad YAML")
	// ErrUnknownKey: a key that the format does not have.
	ErrUnknownKey = errors.New("layout: unknown key")
	// ErrWrongType: a YAML value of the wrong shape (a list where a map is wanted, …).
	ErrWrongType = errors.New("layout: wrong YAML type")
	// ErrMissing: a required key is absent.
	ErrMissing = errors.New("layout: missing key")
	// ErrInvalid: a value that does not parse, is out of range, or conflicts
	// with another value.
	ErrInvalid = errors.New("layout: invalid value")
	// ErrDuplicateName: two items of a list share a name.
	ErrDuplicateName = errors.New("layout: duplicate name")
	// ErrUnresolved: a reference (an array's stand) names nothing.
	ErrUnresolved = errors.New("layout: unresolved name")
	// ErrRead: the layout file could not be read.
	ErrRead = errors.New("layout: cannot read the file")
)

// Error is one problem in a layout file. It prints as
//
//	layouts/cell.yaml:12: nozzle.diameter: want a length, got "5 kg" (kg is a mass unit)
//
// Line is 1-based; 0 means the problem has no line (the file could not be
// read). Field is the path of the key, such as "arrays[2].arc.polar.step"
// (list indices 0-based); it is empty for a problem of the whole file (bad
// YAML). Msg says what was expected.
type Error struct {
	File  string
	Line  int
	Field string
	Msg   string

	kind  error // one of the sentinel errors
	cause error // the error of another package behind Msg, if any
	more  int   // for the last line of a long list: how many problems it stands for
}

// Error returns "File:Line: Field: Msg", leaving out the parts that are empty.
func (e *Error) Error() string { return position(e.File, e.Line, e.Field) + e.Msg }

// Unwrap returns the sentinel error that classifies e and, when the problem
// came from another package (a [units.Error], a geometry or jet error), that
// error too, for errors.Is and errors.As.
func (e *Error) Unwrap() []error {
	out := make([]error, 0, 2)
	if e.kind != nil {
		out = append(out, e.kind)
	}
	if e.cause != nil {
		out = append(out, e.cause)
	}
	return out
}

// Errors is every problem found in one pass over a layout file, sorted by
// line and then by field. Load and Decode never return an empty Errors.
type Errors []*Error

// Error returns the problems one per line, in order, without a final newline.
func (es Errors) Error() string {
	lines := make([]string, len(es))
	for i, e := range es {
		lines[i] = e.Error()
	}
	return strings.Join(lines, "\n")
}

// Unwrap returns each problem, so that errors.Is(err, ErrMissing) asks
// whether any problem is a missing key and errors.As finds the first *Error.
func (es Errors) Unwrap() []error {
	out := make([]error, len(es))
	for i, e := range es {
		out[i] = e
	}
	return out
}

// MaxProblems is how many problems of one file are listed one by one;
// the rest are counted in one last line.
const MaxProblems = 50

// Total returns the number of problems es stands for, counting those that
// a long list summarises in its last line.
func (es Errors) Total() int {
	n := 0
	for _, e := range es {
		n += 1 + e.more
	}
	return n
}

// summarise sorts es and keeps its first MaxProblems problems; the next
// one is kept too, with a count of the rest, which are dropped.
func summarise(es Errors) Errors {
	sortErrors(es)
	if len(es) <= MaxProblems {
		return es
	}
	rest := es[MaxProblems:]
	last := *rest[0]
	last.Msg += fmt.Sprintf(" … and %d more %s after this one (fix these and run again)", len(rest)-1, plural(len(rest)-1, "problem", "problems"))
	last.more = len(rest) - 1
	return append(es[:MaxProblems:MaxProblems], &last)
}

// sortErrors orders es by line, then by field; problems at the same line and
// field keep the order in which they were found.
func sortErrors(es Errors) {
	sort.SliceStable(es, func(i, j int) bool {
		if es[i].Line != es[j].Line {
			return es[i].Line < es[j].Line
		}
		return es[i].Field < es[j].Field
	})
}

// Warning is a remark about a layout that does not stop it being used, such
// as an exhaust collector off the jet axis. Its fields mean what they mean on
// [Error].
type Warning struct {
	File  string
	Line  int
	Field string
	Msg   string
}

// String returns "File:Line: Field: Msg", leaving out the parts that are
// empty, like [Error.Error].
func (w Warning) String() string { return position(w.File, w.Line, w.Field) + w.Msg }

// position returns the "file:line: field: " prefix of a message.
func position(file string, line int, field string) string {
	var b strings.Builder
	if file != "" {
		b.WriteString(file)
		if line > 0 {
			b.WriteString(":")
			b.WriteString(strconv.Itoa(line))
		}
		b.WriteString(": ")
	} else if line > 0 {
		b.WriteString("line ")
		b.WriteString(strconv.Itoa(line))
		b.WriteString(": ")
	}
	if field != "" {
		b.WriteString(field)
		b.WriteString(": ")
	}
	return b.String()
}

// plural returns one or many after n.
func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}
