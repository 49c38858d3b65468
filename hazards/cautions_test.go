package hazards

import (
	"strings"
	"testing"
)

// containsLower answers as strings.Contains(strings.ToLower(s), sub) does,
// for ASCII and non-ASCII text alike.
func TestContainsLower(t *testing.T) {
	for _, s := range []string{"", "Flash point 12 °C", "FLASH POINT", "flash poin", "Autoignition and flash point", "no such words",
		"Flash\u00a0point", "FLASH POİNT", "flash point at the end: flash point", "xflash pointx", "Ａuto"} {
		for _, sub := range []string{"flash point", "autoignition"} {
			if got, want := containsLower(s, sub), strings.Contains(strings.ToLower(s), sub); got != want {
				t.Errorf("containsLower(%q, %q) = %v, want %v", s, sub, got, want)
			}
		}
	}
}
