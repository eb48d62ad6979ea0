/** The portal's home: the client's projects. */
export const HOME_URL = '/projects';
