/**
 * Two stations closer than this are the same station. A hundredth of a foot is the precision a survey is
 * recorded to, so a comparison of stations (the landing's end, a typed road edge) never turns on the last
 * bits of a floating-point sum such as 0.1 + 0.2.
 */
export const STATION_TOLERANCE_FT = 0.01;
