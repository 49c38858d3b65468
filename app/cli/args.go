package cli

import (
	"fmt"
	"strconv"
	"strings"
)

// options are the parsed flags of one command. Flags may come before,
// between or after the positional arguments; "--" ends flag parsing.
type options struct {
	positional []string
	bools      map[string]bool
	values     map[string][]string
}

// parseArgs splits args into positional arguments and flags. boolFlags
// take no value; valueFlags take one ("--pdf out.pdf" or "--pdf=out.pdf")
// and may repeat.
func parseArgs(args []string, boolFlags, valueFlags []string) (*options, error) {
	o := &options{bools: map[string]bool{}, values: map[string][]string{}}
	isBool := map[string]bool{}
	for _, f := range boolFlags {
		isBool[f] = true
	}
	isValue := map[string]bool{}
	for _, f := range valueFlags {
		isValue[f] = true
	}
	for i := 0; i < len(args); i++ {
		a := args[i]
		if a == "--" {
			o.positional = append(o.positional, args[i+1:]...)
			break
		}
		if !strings.HasPrefix(a, "-") || a == "-" {
			o.positional = append(o.positional, a)
			continue
		}
		name := strings.TrimLeft(a, "-")
		value, hasValue := "", false
		if k, v, ok := strings.Cut(name, "="); ok {
			name, value, hasValue = k, v, true
		}
		switch {
		case isBool[name]:
			if hasValue {
				return nil, fmt.Errorf("flag --%s takes no value", name)
			}
			o.bools[name] = true
		case isValue[name]:
			if !hasValue {
				if i+1 >= len(args) {
					return nil, fmt.Errorf("flag --%s needs a value", name)
				}
				i++
				value = args[i]
			}
			if value == "" {
				return nil, fmt.Errorf("flag --%s needs a value (an empty one was given)", name)
			}
			o.values[name] = append(o.values[name], value)
		default:
			return nil, fmt.Errorf("unknown flag %s", a)
		}
	}
	return o, nil
}

func (o *options) value(name, fallback string) string {
	if v := o.values[name]; len(v) > 0 {
		return v[len(v)-1]
	}
	return fallback
}

// last returns the last value of a flag and whether it was given.
func (o *options) last(name string) (string, bool) {
	v := o.values[name]
	if len(v) == 0 {
		return "", false
	}
	return v[len(v)-1], true
}

func (o *options) float(name string) (float64, bool, error) {
	v := o.values[name]
	if len(v) == 0 {
		return 0, false, nil
	}
	x, err := strconv.ParseFloat(v[len(v)-1], 64)
	if err != nil {
		return 0, true, fmt.Errorf("flag --%s = %q: not a number", name, v[len(v)-1])
	}
	return x, true, nil
}

func (o *options) integer(name string, fallback int) (int, error) {
	v := o.values[name]
	if len(v) == 0 {
		return fallback, nil
	}
	n, err := strconv.Atoi(v[len(v)-1])
	if err != nil {
		return 0, fmt.Errorf("flag --%s = %q: not a whole number", name, v[len(v)-1])
	}
	return n, nil
}
