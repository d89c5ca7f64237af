package layout

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"regexp"
	"strconv"
	"strings"
	"time"
	"unicode"
	"unicode/utf8"

	"go.yaml.in/yaml/v3"
)

// MaxDepth is the deepest nesting of maps and lists a layout file may
// have; the format itself nests at most six levels.
const MaxDepth = 32

// utf8BOM is the byte-order mark that some editors and spreadsheets put at
// the start of a UTF-8 file.
var utf8BOM = []byte{0xEF, 0xBB, 0xBF}

// readInput reads the layout or as-built file at path: a regular file (or
// a link to one) of at most MaxInputSize bytes. A problem gives an Errors
// value of one problem, without a line, wrapping ErrRead.
func readInput(path string) ([]byte, error) {
	fail := func(msg string, cause error) error {
		return Errors{{File: path, Msg: msg, kind: ErrRead, cause: cause}}
	}
	f, err := os.Open(path)
	if err != nil {
		return nil, fail("cannot read the file: "+pathReason(err), err)
	}
	defer f.Close()
	st, err := f.Stat()
	if err != nil {
		return nil, fail("cannot read the file: "+pathReason(err), err)
	}
	switch m := st.Mode(); {
	case m.IsDir():
		return nil, fail("is a directory; want a file", nil)
	case !m.IsRegular():
		return nil, fail(fmt.Sprintf("is not a regular file (%s); want a file saved on disk", kindOf(m)), nil)
	case st.Size() > MaxInputSize:
		return nil, fail(fmt.Sprintf("is %s, more than the %s a file may have", mib(st.Size()), mib(MaxInputSize)), nil)
	}
	// The size can change, or be wrong for special file systems: read at
	// most one byte more than allowed.
	data, err := io.ReadAll(io.LimitReader(f, MaxInputSize+1))
	if err != nil {
		return nil, fail("cannot read the file: "+pathReason(err), err)
	}
	if len(data) > MaxInputSize {
		return nil, fail(fmt.Sprintf("is more than the %s a file may have", mib(MaxInputSize)), nil)
	}
	return data, nil
}

// pathReason returns the reason of a file-system error without the path,
// which the message already names.
func pathReason(err error) string {
	var pe *fs.PathError
	if errors.As(err, &pe) {
		return pe.Err.Error()
	}
	return err.Error()
}

// kindOf names a non-regular file mode.
func kindOf(m fs.FileMode) string {
	switch {
	case m&fs.ModeCharDevice != 0, m&fs.ModeDevice != 0:
		return "a device"
	case m&fs.ModeNamedPipe != 0:
		return "a named pipe"
	case m&fs.ModeSocket != 0:
		return "a socket"
	}
	return "a special file"
}

// mib prints a size in bytes as MiB.
func mib(n int64) string { return fmt.Sprintf("%.4g MiB", float64(n)/(1<<20)) }

// checkText records the first byte of data that cannot be in a text file
// read by this package — a NUL, a byte that is not UTF-8, a control
// character other than tab, line feed and carriage return — with its line
// and column, and reports whether there was none. A byte-order mark at the
// start is allowed.
func (d *decoder) checkText(data []byte) bool {
	data = bytes.TrimPrefix(data, utf8BOM)
	line, col := 1, 1
	for i := 0; i < len(data); {
		r, size := utf8.DecodeRune(data[i:])
		var msg string
		switch {
		case r == utf8.RuneError && size <= 1:
			msg = fmt.Sprintf("byte 0x%02X is not UTF-8 text (it looks like Latin-1 or Windows-1252); save the file as UTF-8", data[i])
		case r == 0:
			msg = "a NUL byte: this is a binary file, not a text file"
		case r == '\n':
			line, col = line+1, 1
			i += size
			continue
		case r < 0x20 && r != '\t' && r != '\r', r == 0x7F, r >= 0x80 && r <= 0x9F:
			msg = fmt.Sprintf("control character U+%04X; remove it", r)
		case r == 0xFEFF:
			msg = "a byte-order mark inside the file; remove it"
		}
		if msg != "" {
			d.add(ErrSyntax, nil, line, "", fmt.Sprintf("column %d: %s", col, msg))
			return false
		}
		i += size
		col++
	}
	return true
}

// checkTree records, at its line, every value with a custom YAML tag
// (!name) or a binary one, and a map or list nested deeper than MaxDepth;
// it reports whether the nesting is within MaxDepth (the tree is not read
// further otherwise).
func (d *decoder) checkTree(n *yaml.Node, depth int) bool {
	if depth > MaxDepth {
		d.errorf(ErrSyntax, n.Line, "", "nested more than %d levels deep; a layout nests at most six", MaxDepth)
		return false
	}
	if n.Style&yaml.TaggedStyle != 0 {
		if t := n.ShortTag(); !strings.HasPrefix(t, "!!") || t == "!!binary" {
			d.errorf(ErrSyntax, n.Line, "", "YAML tag %s is not supported; write the value plainly", n.Tag)
		}
	}
	for _, c := range n.Content {
		if !d.checkTree(c, depth+1) {
			return false
		}
	}
	return true
}

// checkLabel records a text of the layout (a name, a title) that holds a
// control character or a bidirectional override — they would reach the
// terminal, the sheet and the exports — or is longer than max characters;
// it reports whether there was no problem.
func (d *decoder) checkLabel(v string, line int, field string, max int) bool {
	for _, r := range v {
		if unicode.IsControl(r) || (r >= 0x202A && r <= 0x202E) || (r >= 0x2066 && r <= 0x2069) {
			d.errorf(ErrInvalid, line, field, "holds the character U+%04X (a control or text-direction character); write plain text on one line", r)
			return false
		}
	}
	if n := utf8.RuneCountInString(v); n > max {
		d.errorf(ErrInvalid, line, field, "is %d characters long; want at most %d", n, max)
		return false
	}
	return true
}

// isoDate matches a date written with numbers, which must then be a real
// date: 2026-11-30, 2026/11/30 or 30.11.2026.
var isoDate = regexp.MustCompile(`^(\d{4})[-/](\d{1,2})[-/](\d{1,2})$|^(\d{1,2})\.(\d{1,2})\.(\d{4})$`)

// checkDate records a date written with numbers that is not a date of the
// calendar (2026-13-45); other texts ("March 2026") are kept as written.
func (d *decoder) checkDate(v string, line int, field string) bool {
	m := isoDate.FindStringSubmatch(strings.TrimSpace(v))
	if m == nil {
		return true
	}
	y, mo, day := m[1], m[2], m[3]
	if y == "" {
		y, mo, day = m[6], m[5], m[4]
	}
	yi, _ := strconv.Atoi(y) // digits only, by the pattern
	mi, _ := strconv.Atoi(mo)
	di, _ := strconv.Atoi(day)
	t := time.Date(yi, time.Month(mi), di, 0, 0, 0, 0, time.UTC)
	if mi < 1 || mi > 12 || t.Day() != di {
		d.errorf(ErrInvalid, line, field, "%q is not a date of the calendar; want year-month-day, such as 2026-11-30", v)
		return false
	}
	return true
}
