/** Case and project files (JSON through Jackson), read with every error naming its field. */
package org.finstack.io;
