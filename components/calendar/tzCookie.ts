/** The cookie holding the browser's IANA time zone, so server pages know which day "today" is. */
export const TZ_COOKIE = "iq_tz";
