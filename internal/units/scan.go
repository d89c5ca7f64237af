package units

import (
	"fmt"
	"math"
	"strconv"
	"strings"
	"unicode"
	"unicode/utf8"
)

// scanner walks a trimmed input left to right. It reads numbers, unit
// symbols and the whitespace between them; it never fails by itself but
// returns a reason in words that Parse puts into an *Error.
type scanner struct {
	s   string
	pos int // byte offset of the next unread rune
}

// number is one number as written.
type number struct {
	v     float64 // its value, finite
	whole bool    // written as digits only: no point, exponent or fraction
	text  string  // as written, for messages
}

func (sc *scanner) done() bool { return sc.pos >= len(sc.s) }

// peekByte returns the next byte, or 0 at the end.
func (sc *scanner) peekByte() byte {
	if sc.done() {
		return 0
	}
	return sc.s[sc.pos]
}

// skipSpace moves past any amount of Unicode white space.
func (sc *scanner) skipSpace() {
	for !sc.done() {
		r, size := utf8.DecodeRuneInString(sc.s[sc.pos:])
		if !unicode.IsSpace(r) {
			return
		}
		sc.pos += size
	}
}

// token returns the text from the current position to the next white space,
// without moving; it names the offending part in messages.
func (sc *scanner) token() string {
	rest := sc.s[sc.pos:]
	if i := strings.IndexFunc(rest, unicode.IsSpace); i >= 0 {
		return rest[:i]
	}
	return rest
}

// unit reads a unit symbol: the longest run of runes that are neither white
// space nor ASCII digits. It returns "" when a digit, a space or the end
// follows at once. "m/s" and "°C" are single symbols; "5 m m" gives "m" twice.
func (sc *scanner) unit() string {
	start := sc.pos
	for !sc.done() {
		r, size := utf8.DecodeRuneInString(sc.s[sc.pos:])
		if unicode.IsSpace(r) || isDigit(sc.s[sc.pos]) {
			break
		}
		sc.pos += size
	}
	return sc.s[start:sc.pos]
}

// number reads an unsigned number in one of the forms
//
//	12   12.5   .5   5.   1.5e3   1.5E-3   3/4   6-1/2   6 1/2
//
// A fraction's numerator and denominator are digits only; a whole number in
// front of a fraction is digits only, and the fraction then must be below 1.
// On failure number returns a non-empty reason and the position is undefined.
func (sc *scanner) number() (number, string) {
	start := sc.pos
	if !startsNumber(sc.s[sc.pos:]) {
		return number{}, notANumberReason(sc.token())
	}
	sc.digits()
	plain := true
	if sc.peekByte() == '.' {
		sc.pos++
		sc.digits()
		plain = false
	}
	if end, ok := exponentEnd(sc.s, sc.pos); ok {
		sc.pos = end
		plain = false
	}
	text := sc.s[start:sc.pos]
	v, err := strconv.ParseFloat(text, 64)
	if math.IsInf(v, 0) {
		return number{}, reasonNotFinite
	}
	if err != nil {
		return number{}, notANumberReason(text)
	}
	if !plain {
		return number{v: v, text: text}, ""
	}

	// A plain whole number: a fraction may follow, directly ("3/4"), after a
	// hyphen ("6-1/2") or after white space ("6 1/2").
	if num, den, end, ok := fractionAt(sc.s, start); ok {
		sc.pos = end
		return fraction(0, num, den, false, sc.s[start:end])
	}
	if sc.peekByte() == '-' {
		if num, den, end, ok := fractionAt(sc.s, sc.pos+1); ok {
			sc.pos = end
			return fraction(v, num, den, true, sc.s[start:end])
		}
	}
	save := sc.pos
	sc.skipSpace()
	if sc.pos > save {
		if num, den, end, ok := fractionAt(sc.s, sc.pos); ok {
			sc.pos = end
			return fraction(v, num, den, true, sc.s[start:end])
		}
	}
	sc.pos = save
	return number{v: v, whole: true, text: text}, ""
}

// digits moves past ASCII digits and returns the new position.
func (sc *scanner) digits() int {
	for !sc.done() && isDigit(sc.s[sc.pos]) {
		sc.pos++
	}
	return sc.pos
}

// fraction builds whole + num/den. In a mixed number (mixed true) the
// fraction must be below 1.
func fraction(whole float64, num, den string, mixed bool, text string) (number, string) {
	n, errN := strconv.ParseFloat(num, 64)
	d, errD := strconv.ParseFloat(den, 64)
	if errN != nil || errD != nil || math.IsInf(n, 0) || math.IsInf(d, 0) {
		return number{}, reasonNotFinite
	}
	if d == 0 {
		return number{}, fmt.Sprintf("zero denominator in %q", text)
	}
	if mixed && n >= d {
		return number{}, fmt.Sprintf("the fraction in %q must be below 1", text)
	}
	return number{v: whole + n/d, text: text}, ""
}

// fractionAt matches digits "/" digits at byte offset i of s and returns the
// two digit strings and the offset after the match.
func fractionAt(s string, i int) (num, den string, end int, ok bool) {
	j := i
	for j < len(s) && isDigit(s[j]) {
		j++
	}
	if j == i || j >= len(s) || s[j] != '/' {
		return "", "", 0, false
	}
	k := j + 1
	for k < len(s) && isDigit(s[k]) {
		k++
	}
	if k == j+1 {
		return "", "", 0, false
	}
	return s[i:j], s[j+1 : k], k, true
}

// exponentEnd matches an exponent [eE][+-]?digits at byte offset i of s.
func exponentEnd(s string, i int) (int, bool) {
	if i >= len(s) || (s[i] != 'e' && s[i] != 'E') {
		return 0, false
	}
	j := i + 1
	if j < len(s) && (s[j] == '+' || s[j] == '-') {
		j++
	}
	k := j
	for k < len(s) && isDigit(s[k]) {
		k++
	}
	if k == j {
		return 0, false
	}
	return k, true
}

// startsNumber reports whether s begins with a digit, or a point and a digit.
func startsNumber(s string) bool {
	if s == "" {
		return false
	}
	if isDigit(s[0]) {
		return true
	}
	return len(s) > 1 && s[0] == '.' && isDigit(s[1])
}

// notANumberReason explains why tok, found where a number belongs, is not one.
func notANumberReason(tok string) string {
	word := strings.ToLower(strings.TrimLeft(tok, "+-"))
	if i := strings.IndexFunc(word, func(r rune) bool { return !unicode.IsLetter(r) }); i >= 0 {
		word = word[:i]
	}
	switch {
	case word == "nan" || word == "inf" || word == "infinity":
		return reasonNotFinite
	case tok == "":
		return "missing number"
	case tok[0] == '+' || tok[0] == '-':
		return fmt.Sprintf("a sign is allowed only at the start, got %q", tok)
	}
	return fmt.Sprintf("expected a number, got %q", tok)
}

func isDigit(b byte) bool { return '0' <= b && b <= '9' }
